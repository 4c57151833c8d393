/**
 * Pumps: pump curves given as [flow m³/h, head kPa] points, piecewise-linear
 * interpolation without extrapolation, curve checks, and the pump/system
 * operating point by bisection.
 */
export * from "./curve";
export * from "./affinity";
