/**
 * The sizing problem in the form the solvers take, with the flows fixed:
 *
 *   minimise   Σ_i cost_i(s_i) + Σ_g K_g·H_g
 *   subject to fixed_j + Σ_{i∈P_j} sign_ji·dp_i,m(j)(s_i) ≤ limit_g(j)   every circuit j
 *              H_g = max_{j∈g} (fixed_j + Σ …)                          required head of pump g
 *
 * i: a pipe the optimiser may resize, s_i one of its allowed sizes (velocity
 * already met in every mode); j: a circuit in one mode, P_j the free pipes on
 * its path, sign_ji = ±1 the direction the path crosses the pipe's flow,
 * dp_i,m(s) ≥ 0 the pipe's Darcy–Weisbach drop at its design flow of mode m;
 * fixed_j: everything else on the circuit (parts, locked pipes), which does not
 * depend on the sizes when the flows are fixed (true on a tree). g: a pump in
 * one mode, limit_g = available head − margin, K_g = life-cost of a kPa (0 for
 * the pipe-cost objective).
 */

export const FEAS_TOL_KPA = 1e-9;

export interface SizeOption {
  size: string;
  /** price per metre × length */
  cost: number;
  /** |Δp| at this size, kPa, per mode index (0 where the pipe carries nothing) */
  dp: Float64Array;
}

export interface FreePipe {
  id: string;
  options: SizeOption[];
  /** option index of the drawn size, −1 when the drawn size is not allowed */
  drawn: number;
}

export interface Circuit {
  group: number;
  load: string;
  fixedKpa: number;
  /** free-pipe indices on the path and the sign of each */
  pipes: Int32Array;
  sign: Int8Array;
}

export interface HeadGroup {
  mode: number;
  pumpId: string;
  limitKpa: number;
  /** K_g: objective per kPa of required head (0 for pipe cost) */
  perKpa: number;
}

export interface Problem {
  pipes: FreePipe[];
  circuits: Circuit[];
  groups: HeadGroup[];
}

/** Coefficient of pipe (position t on circuit j) at option s. */
export const coeff = (p: Problem, j: number, t: number, s: number): number => {
  const c = p.circuits[j]!;
  return c.sign[t]! * p.pipes[c.pipes[t]!]!.options[s]!.dp[p.groups[c.group]!.mode]!;
};

export interface Evaluation {
  cost: number;
  /** per circuit: its Δp, kPa */
  dp: Float64Array;
  /** per group: the required head (largest circuit Δp), −Infinity when it has no circuit */
  head: Float64Array;
  objective: number;
  feasible: boolean;
}

/** Cost, circuit drops, heads and feasibility of one choice (option index per free pipe). */
export function evaluate(p: Problem, choice: ArrayLike<number>): Evaluation {
  let cost = 0;
  p.pipes.forEach((pipe, i) => (cost += pipe.options[choice[i]!]!.cost));
  const dp = new Float64Array(p.circuits.length);
  const head = new Float64Array(p.groups.length).fill(-Infinity);
  let feasible = true;
  p.circuits.forEach((c, j) => {
    let s = c.fixedKpa;
    for (let t = 0; t < c.pipes.length; t++) s += coeff(p, j, t, choice[c.pipes[t]!]!);
    dp[j] = s;
    if (s > head[c.group]!) head[c.group] = s;
    if (s > p.groups[c.group]!.limitKpa + FEAS_TOL_KPA) feasible = false;
  });
  let objective = cost;
  p.groups.forEach((g, k) => {
    if (g.perKpa > 0 && head[k]! > -Infinity) objective += g.perKpa * head[k]!;
  });
  return { cost, dp, head, objective, feasible };
}

/** Circuits each free pipe lies on, with its position in the circuit's list. */
export function circuitsOfPipes(p: Problem): { circuit: number[]; at: number[] }[] {
  const out = p.pipes.map(() => ({ circuit: [] as number[], at: [] as number[] }));
  p.circuits.forEach((c, j) => {
    for (let t = 0; t < c.pipes.length; t++) {
      const o = out[c.pipes[t]!]!;
      o.circuit.push(j);
      o.at.push(t);
    }
  });
  return out;
}
