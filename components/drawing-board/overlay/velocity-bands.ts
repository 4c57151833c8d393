/**
 * Velocity bands for colouring pipes once sized. Below ~0.3 m/s air and dirt
 * settle out and auto air vents see little; 0.3–0.7 m/s is quiet but wider than
 * it needs to be; from 0.7 m/s to the design's maxVelocityMps is the working
 * range; above it flow noise and erosion start (common practice, not a standard).
 * Colours are our own palette (tailwind.config.ts), not a program's legend.
 */
export type VelocityBand = "none" | "slow" | "moderate" | "good" | "high";

export const SLOW_BELOW_MPS = 0.3;
export const MODERATE_BELOW_MPS = 0.7;

export function velocityBand(velocityMps: number | null | undefined, maxVelocityMps: number): VelocityBand {
  if (velocityMps === null || velocityMps === undefined || !Number.isFinite(velocityMps)) return "none";
  const v = Math.abs(velocityMps);
  if (v > maxVelocityMps) return "high";
  if (v < SLOW_BELOW_MPS) return "slow";
  if (v < Math.min(MODERATE_BELOW_MPS, maxVelocityMps)) return "moderate";
  return "good";
}

export const bandStyle: Record<VelocityBand, { color: string; label: string }> = {
  none: { color: "#8a8378", label: "not computed" },
  slow: { color: "#8a8378", label: "slow" },
  moderate: { color: "#dc9a6a", label: "moderate" },
  good: { color: "#2f7d4f", label: "good" },
  high: { color: "#b42318", label: "too fast" },
};

/** Legend rows with the ranges written out for this design's limit. */
export function legendRows(maxVelocityMps: number): { band: VelocityBand; color: string; label: string; range: string }[] {
  const max = maxVelocityMps.toFixed(1);
  const mid = Math.min(MODERATE_BELOW_MPS, maxVelocityMps).toFixed(1);
  return [
    { band: "slow", ...bandStyle.slow, range: `< ${SLOW_BELOW_MPS} m/s` },
    { band: "moderate", ...bandStyle.moderate, range: `${SLOW_BELOW_MPS}–${mid} m/s` },
    { band: "good", ...bandStyle.good, range: `${mid}–${max} m/s` },
    { band: "high", ...bandStyle.high, range: `> ${max} m/s` },
  ];
}
