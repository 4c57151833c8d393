/**
 * Roots of f(g) = 0 with one unknown per entry, each stepped on its own by the secant method
 * (Burden & Faires, Numerical Analysis, 9th ed., §2.3, Algorithm 2.4). The first step, with no
 * earlier point, and any step the secant cannot give (a residual that did not move divides by
 * zero) is the substitution g ← g + f instead (the fixed point g = H(g), with f = H − g).
 * design.ts uses it for the heads of pumps beside passive paths, which couple each other only
 * weakly, so one secant per pump is enough.
 */
export interface Settled {
  /** the last values tried */
  values: number[];
  /** largest |f| at those values */
  residual: number;
  settled: boolean;
  /** steps taken */
  rounds: number;
}

/** `startResidual`: f at `start`, which the caller has already (design.ts solved the network there). */
export function settleBySecant(
  start: readonly number[],
  startResidual: readonly number[],
  residual: (values: readonly number[]) => number[],
  maxRounds: number,
  tolerance: number,
): Settled {
  let g = [...start];
  let f = [...startResidual];
  let prev: { g: number[]; f: number[] } | null = null;
  for (let rounds = 0; ; rounds++) {
    const worst = Math.max(...f.map(Math.abs));
    if (worst < tolerance) return { values: g, residual: worst, settled: true, rounds };
    if (rounds >= maxRounds) return { values: g, residual: worst, settled: false, rounds };
    const next = g.map((gi, i) => {
      const fi = f[i]!;
      const secant = prev ? gi - (fi * (gi - prev.g[i]!)) / (fi - prev.f[i]!) : gi + fi;
      return Number.isFinite(secant) ? secant : gi + fi;
    });
    prev = { g, f };
    g = next;
    f = residual(g);
  }
}
