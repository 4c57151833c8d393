/**
 * sizing — design mode: loads at q = P/(ρ·cp·ΔT), flows by continuity (the
 * network solver with fixed demands), per-pipe velocity / Re / f / Δp /
 * gradient and suggested size, per-part Δp by Kv, circuits with the index
 * circuit, pump duty and balancing Kv, the dp-bypass setting, the expansion
 * vessel (EN 12828 Annex D), system volume, emitter outputs (EN 442) and the
 * cylinder's reheat time.
 */
export { createContext, type EngineContext, type FluidState } from "./context";
export { runMode, type ModeRun } from "./mode";
export { sizeBypasses, BYPASS_MARGIN_FRACTION, BYPASS_MARGIN_MIN_KPA } from "./bypass";
export { systemVolume, vesselResult, volumeResult } from "./vessel";
export { emitterResults, hotWaterResult } from "./emitters";
