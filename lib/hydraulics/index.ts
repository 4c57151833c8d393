/**
 * The hydraulic engine (no React, Next, Knex, zustand or xyflow here).
 * Entry points: calculate(json) and calculateSchematic(doc).
 */
export { calculate, calculateSchematic, ENGINE_VERSION, type CalculateResult } from "./calculate";
