/**
 * Reynolds number Re = |v|·D/ν (dimensionless), defining equation (Reynolds 1883).
 * @param velocityMps mean velocity v, m/s (sign ignored)
 * @param innerDiameterM inner diameter D, m (> 0)
 * @param kinematicViscosityM2s kinematic viscosity ν, m²/s (> 0)
 * Throws RangeError naming the argument when D or ν is not positive/finite.
 */
export function reynolds(velocityMps: number, innerDiameterM: number, kinematicViscosityM2s: number): number {
  if (!Number.isFinite(velocityMps)) throw new RangeError(`velocityMps must be finite, got ${velocityMps}`);
  if (!(innerDiameterM > 0) || !Number.isFinite(innerDiameterM)) {
    throw new RangeError(`innerDiameterM must be > 0, got ${innerDiameterM}`);
  }
  if (!(kinematicViscosityM2s > 0) || !Number.isFinite(kinematicViscosityM2s)) {
    throw new RangeError(`kinematicViscosityM2s must be > 0, got ${kinematicViscosityM2s}`);
  }
  return (Math.abs(velocityMps) * innerDiameterM) / kinematicViscosityM2s;
}

/** The citation shown with this formula's working. */
export const REYNOLDS_SOURCE = "Reynolds number Re = v·d/ν, defining equation (O. Reynolds, 1883)";
