/**
 * Hydraulics engine — pure formula modules (SI inside, units in every name).
 * Sub-folders: fluids, friction, pipes, losses, emitters, vessels, hot-water, pumps;
 * flow.ts (Φ = ṁ·cp·ΔT) and units.ts (edge conversions).
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
