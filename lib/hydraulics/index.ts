/**
 * Hydraulics engine — pure formula modules (SI inside, units in every name).
 * Sub-folders: fluids, friction, pipes, losses, emitters, vessels, hot-water, pumps;
 * flow.ts (Φ = ṁ·cp·ΔT) and units.ts (edge conversions). The calculation itself:
 * network/ (model, gradient-method solver), sizing/ (design mode), scenarios/
 * (simulation), findings/; entry points calculate(json) and calculateSchematic(doc).
 * No React, Next, Knex, zustand or xyflow here.
 */
export * from "./units";
export * from "./flow";
export * from "./fluids";
export * from "./friction";
export * from "./pipes";
export * from "./losses";
export * from "./emitters";
export * from "./vessels";
export * from "./hot-water";
export * from "./pumps";
export { calculate, calculateSchematic, ENGINE_VERSION, type CalculateResult } from "./calculate";
