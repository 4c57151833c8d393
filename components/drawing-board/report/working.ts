/**
 * "Show working" for the numbers in the sizing report: the formula, the
 * inputs with their units as this schematic gives them, the intermediate
 * values, the answer and the published source — the citation the engine's
 * own function carries (imported from it, never re-typed). Where a step is an
 * engine function (ΣK, LMTD, the EN 12828 vessel, fluid properties) it is
 * called rather than re-implemented, so the working cannot drift from the
 * engine. Each working also carries its raw `figures`, so a check (and a
 * reader) can reproduce the reported number from them.
 */
export type { Working, WorkingLine } from "./working-base";
export { assumedLines, f } from "./working-base";
export { pipeDpWorking, pipeFlowWorking, velocityWorking } from "./working-pipes";
export { balancingKvWorking, circuitDpWorking, designFlowWorking, excessWorking } from "./working-circuits";
export { availableHeadWorking, pumpSettingWorking, requiredHeadWorking } from "./working-pump";
export { bypassOpeningWorking, minVolumeWorking, prechargeWorking, reheatWorking, shutFlowWorking, systemVolumeWorking, vesselWorking } from "./working-plant";
export { emitterWorking } from "./working-emitters";
