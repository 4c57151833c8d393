/**
 * Pipe catalogue: outer diameter × wall per size, inner diameter and absolute
 * roughness ε, with the source of each row (references.md §3.3, §4).
 * Material names are the contract's: copper, steel, pex ("PE-X"), multilayer.
 */

export type PipeMaterial = "copper" | "steel" | "pex" | "multilayer";
export const pipeMaterials: readonly PipeMaterial[] = ["copper", "steel", "pex", "multilayer"];

export interface PipeSize {
  size: string;
  outerDiameterMm: number;
  wallMm: number;
  /** d_i = OD − 2·wall, mm. */
  innerDiameterMm: number;
  /** Absolute roughness ε, mm. */
  roughnessMm: number;
  source: string;
}

/** Round to 1e-6 mm so that OD − 2·wall has no binary-float residue (13.6, not 13.600000000000001). */
const mm = (x: number): number => Math.round(x * 1e6) / 1e6;

function row(size: string, od: number, wall: number, roughnessMm: number, source: string): PipeSize {
  return { size, outerDiameterMm: od, wallMm: wall, innerDiameterMm: mm(od - 2 * wall), roughnessMm, source };
}

const CU_EPS = "ε 0.0015 mm drawn copper (Binder 1973; Moody 1944; White, Fluid Mechanics Table 6.1)";
const CU = `EN 1057 R250 half-hard (UK 'Table X') OD×wall; ${CU_EPS}`;
const ST = "EN 10255 medium series (ex-BS 1387 M) wall; OD per ISO 65/EN 10220 series 1 (from memory); ε 0.045 mm new commercial steel (Binder; White Table 6.1)";
const PEX = "OD×wall as named (16×2, 20×2 SDR 8/10 common UFH pipe, ISO 15875-2 from memory; 26×3 and 32×3 maker sizes, common practice); ε 0.007 mm DIN 1988-300 plastic pipe (from memory)";
const ML = "ISO 21003 multilayer, maker-specific OD×wall (common practice); ε 0.007 mm DIN 1988-300 composite pipe (from memory)";

export const pipeCatalogue: Record<PipeMaterial, readonly PipeSize[]> = {
  copper: [
    row("10", 10, 0.6, 0.0015, `EN 1057 R250 10×0.6 (Table X wall from memory); ${CU_EPS}`),
    row("15", 15, 0.7, 0.0015, CU),
    row("22", 22, 0.9, 0.0015, CU),
    row("28", 28, 0.9, 0.0015, CU),
    row("35", 35, 1.2, 0.0015, CU),
    row("42", 42, 1.2, 0.0015, CU),
    row("54", 54, 1.2, 0.0015, CU),
  ],
  steel: [
    row("DN15", 21.3, 2.6, 0.045, ST),
    row("DN20", 26.9, 2.6, 0.045, ST),
    row("DN25", 33.7, 3.2, 0.045, ST),
    row("DN32", 42.4, 3.2, 0.045, ST),
    row("DN40", 48.3, 3.2, 0.045, ST),
    row("DN50", 60.3, 3.6, 0.045, ST),
  ],
  pex: [row("16x2", 16, 2, 0.007, PEX), row("20x2", 20, 2, 0.007, PEX), row("26x3", 26, 3, 0.007, PEX), row("32x3", 32, 3, 0.007, PEX)],
  multilayer: [
    row("16x2", 16, 2, 0.007, ML),
    row("20x2", 20, 2, 0.007, ML),
    row("26x3", 26, 3, 0.007, ML),
    row("32x3", 32, 3, 0.007, ML),
  ],
};

/** The catalogue row for (material, size), or undefined when there is none. */
export function findPipeSize(material: PipeMaterial, size: string): PipeSize | undefined {
  return pipeCatalogue[material]?.find((p) => p.size === size);
}

/**
 * Water content per metre of pipe, L/m: V = π·d_i²/4 (d_i in mm → mm²; 1 mm² × 1 m = 1e-3 L).
 * Throws RangeError when innerDiameterMm is not positive/finite.
 */
export function pipeWaterVolumeLPerM(innerDiameterMm: number): number {
  if (!(innerDiameterMm > 0) || !Number.isFinite(innerDiameterMm)) {
    throw new RangeError(`innerDiameterMm must be > 0, got ${innerDiameterMm}`);
  }
  return (Math.PI * innerDiameterMm * innerDiameterMm) / 4 / 1000;
}
