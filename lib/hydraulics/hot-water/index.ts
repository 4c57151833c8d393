/**
 * Hot water: domestic hot-water cylinder reheat time by the energy balance
 * t = V·ρ·cp·ΔT / P (no losses, constant coil output).
 */
export * from "./cylinder";
