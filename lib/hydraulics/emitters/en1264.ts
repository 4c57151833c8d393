/**
 * EN 1264-2 basic characteristic curve of floor heating (Basiskennlinie), recalled
 * from memory and found in print in the trade journal IKZ ("Gut geplant ist optimal
 * wärmeversorgt", ikz.de, quoting DIN EN 1264: q = 8,92·(t_FB,m − t_i)^1,1); it gives
 * the "≈ 100 W/m² at 9 K" of EN 1264 trade pages (references.md §9):
 *   q = 8.92·(θ_F,m − θ_i)^1.1   W/m²
 * θ_F,m mean floor surface °C, θ_i room °C. Valid for surface excess 0…~15 K
 * (EN 1264 limits: 29 °C occupied zone, 35 °C perimeter).
 */
export const EN1264_COEFFICIENT = 8.92;
export const EN1264_EXPONENT = 1.1;

/** Heat flux q (W/m²) at mean surface temperature surfaceC and room roomC (°C); 0 if surface ≤ room. */
export function en1264HeatFluxWm2(surfaceC: number, roomC: number): number {
  if (!Number.isFinite(surfaceC)) throw new RangeError(`surfaceC must be finite, got ${surfaceC}`);
  if (!Number.isFinite(roomC)) throw new RangeError(`roomC must be finite, got ${roomC}`);
  const dt = surfaceC - roomC;
  return dt <= 0 ? 0 : EN1264_COEFFICIENT * dt ** EN1264_EXPONENT;
}

/** Mean surface temperature (°C) that gives heat flux qWm2 (≥ 0) at room roomC: θ_i + (q/8.92)^(1/1.1). */
export function en1264SurfaceTemperatureC(qWm2: number, roomC: number): number {
  if (!(qWm2 >= 0) || !Number.isFinite(qWm2)) throw new RangeError(`qWm2 must be ≥ 0, got ${qWm2}`);
  if (!Number.isFinite(roomC)) throw new RangeError(`roomC must be finite, got ${roomC}`);
  return roomC + (qWm2 / EN1264_COEFFICIENT) ** (1 / EN1264_EXPONENT);
}
