/**
 * scenarios — what really flows with the valves as they are: the gradient
 * method with pumps on their curves and no flow forced (simulate.ts), then
 * temperatures by flow-weighted mixing with EN 442 emitters (thermal.ts), for
 * the contract's default scenarios or the schematic's own list (list.ts).
 */
export { scenarioList, MAX_ZONE_SCENARIOS, type ScenarioSpec } from "./list";
export { runScenarios, scenarioResult, scenarioState } from "./run";
export { simulate, type Simulation } from "./simulate";
export { thermal, type Thermal } from "./thermal";
