/**
 * optimise — whole-network pipe sizing: the cheapest sizes (or least pipe +
 * pumping-energy cost) that meet the velocity limit in every mode and keep
 * every circuit within its pump's head. engine-view → extract (fixed-flow
 * problem) → tree-dp (exact on circuit trees) or branch-bound with lagrange
 * (bound and gap) → checked by the engine. Prices: prices.ts (invented demo
 * table; the firm's list enters as options.prices). Energy: life-cost.ts.
 */
export { optimise, type OptimiseAnswer } from "./request";
export { optimiseSchematic, type OptimiseResult } from "./optimise";
export { optimiseOptionsSchema, DEFAULT_HEAD_MARGIN_KPA, type OptimiseOptions, type OptimiseOptionsInput } from "./options";
export { DEFAULT_PRICES_PER_M } from "./prices";
export { LIFE_COST_ASSUMPTIONS } from "./life-cost";
export type { Snapshot } from "./snapshot";
