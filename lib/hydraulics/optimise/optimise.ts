/**
 * Whole-network sizing: the cheapest pipe sizes (or the least pipe cost +
 * pumping energy) that keep every pipe within design.maxVelocityMps in every
 * mode and every circuit within its pump's available head at the design
 * flow less the margin. The engine's design modes give flows, circuits and
 * pump duties (engine-view.ts); extract.ts turns them into the fixed-flow
 * problem; the circuit-tree DP solves it exactly, branch and bound where the
 * DP does not apply. Every proposal is checked by running the engine again on
 * the changed document: a proposal that fails the check is never returned.
 *
 * Looped design networks (flows follow the sizes): solve at the flows of the
 * current proposal, re-run the engine, repeat (successive fixed-flow
 * problems) until the proposal repeats; a pump found short at the new flows
 * gets that shortfall as extra margin in the next round. The best checked
 * proposal is returned; its bound holds for the fixed-flow problem at its own
 * flows only, and the answer says so.
 */
import { finding, type Finding } from "@/lib/hydraulics/findings/finding";
import type { Schematic } from "@/lib/schematic/schema";
import { solveBranchAndBound } from "./branch-bound";
import { engineView, type EngineView } from "./engine-view";
import { extract, type Extraction } from "./extract";
import { lowestHeads } from "./lagrange";
import type { OptimiseOptions } from "./options";
import { priceList, type PriceList } from "./prices";
import { FEAS_TOL_KPA, type Problem } from "./problem";
import { pipeCost, snapshot, violations, type Snapshot } from "./snapshot";
import { solveTreeDp, type Solved } from "./tree-dp";

export interface OptimiseResult {
  /** size of every pipe, by id */
  sizes: Record<string, string>;
  /** Σ price × length of every pipe at those sizes */
  cost: number;
  before: Snapshot;
  after: Snapshot;
  feasible: boolean;
  findings: Finding[];
  objective: OptimiseOptions["objective"];
  headMarginKpa: number;
  changes: { id: string; from: string; to: string; lengthM: number }[];
  method: Solved["method"];
  /** proven optimal (a tree, search finished) */
  exact: boolean;
  /** (objective − lower bound) / objective of the fixed-flow problem; 0 when exact, null when unknown */
  gap: number | null;
  looped: boolean;
  priceSource: Record<string, "options" | "default-demo">;
}

const LOOP_ROUNDS = 8;

export function optimiseSchematic(doc: Schematic, options: OptimiseOptions): OptimiseResult {
  const prices = priceList(options.prices);
  const findings: Finding[] = [];
  const view = engineView(doc);
  const before = snapshot(doc, view, options, prices);
  const base = {
    before,
    objective: options.objective,
    headMarginKpa: options.headMarginKpa,
    looped: view.looped,
    priceSource: Object.fromEntries([...new Set(doc.pipes.map((p) => p.material))].map((m) => [m, prices.sourceOf(m)])),
  };
  const unpriced = pipeCost(doc, prices).unpriced;
  if (unpriced.length > 0) findings.push(finding("warning", "optimise.no-price", `no price for the drawn size of ${unpriced.slice(0, 5).join(", ")}${unpriced.length > 5 ? ` and ${unpriced.length - 5} more` : ""}: counted as 0 in the cost`, unpriced));
  const refuse = (extra: Finding[]): OptimiseResult => ({
    ...base,
    sizes: Object.fromEntries(doc.pipes.map((p) => [p.id, p.size])),
    cost: before.cost,
    after: before,
    feasible: false,
    findings: [...findings, ...extra],
    changes: [],
    method: "none",
    exact: false,
    gap: null,
  });
  if (view.errors.length > 0 || view.runs.length === 0) {
    return refuse([...view.errors, finding("error", "optimise.not-computed", "the engine cannot compute design flows for this schematic (see the other findings), so no sizes are proposed")]);
  }
  let ex = extract(view, options, prices);
  if (ex.blockers.length > 0) return refuse(ex.blockers);
  const shortfall = headShortfall(ex.problem, view);
  if (shortfall) return refuse([shortfall]);
  findings.push(...keptNotes(doc, ex));

  // Solve; on a looped network repeat at the flows of each proposal.
  let best: { doc: Schematic; view: EngineView; solved: Solved; objective: number } | null = null;
  const seen = new Set<string>();
  let current = doc;
  let lastFailure: { message: string; refs: string[] }[] = [];
  const extraMargin = new Map<string, number>();
  for (let round = 0; round < (view.looped ? LOOP_ROUNDS : 1); round++) {
    const problem = round === 0 ? ex.problem : tightened(ex.problem, extraMargin);
    const solved = solve(problem);
    if (!solved.choice) {
      if (round === 0) return refuse([infeasibleFinding(problem, view, "no combination of offered sizes keeps every circuit within its pump's head")]);
      break;
    }
    const proposal = applyChoice(current, ex, solved.choice);
    const key = JSON.stringify(proposal.pipes.map((p) => p.size));
    if (seen.has(key)) break;
    seen.add(key);
    const check = engineView(proposal);
    const broken = check.errors.length > 0 ? check.errors.map((e) => ({ message: e.message, refs: e.refs })) : violations(proposal, check, options);
    if (broken.length === 0) {
      const objective = objectiveOf(snapshot(proposal, check, options, prices), options);
      if (!best || objective < best.objective) best = { doc: proposal, view: check, solved, objective };
    } else {
      lastFailure = broken;
      for (const d of check.pumps) {
        if (d.requiredHeadKpa === null || d.availableHeadKpa === null) continue;
        const over = d.requiredHeadKpa - (d.availableHeadKpa - options.headMarginKpa);
        const key = `${check.runs.findIndex((r) => r.result.mode === d.mode)}:${d.id}`;
        if (over > 0) extraMargin.set(key, (extraMargin.get(key) ?? 0) + over + 1e-3);
      }
    }
    if (!view.looped) break;
    current = proposal;
    ex = extract(check, options, prices);
    if (ex.blockers.length > 0) break;
  }
  if (!best) {
    const why = lastFailure.slice(0, 3).map((b) => b.message).join("; ");
    return refuse([finding("error", "optimise.check-failed", `the proposal did not pass the engine's own check (${why}), so none is given`, lastFailure.flatMap((b) => b.refs))]);
  }
  if (view.looped) {
    findings.push(finding("info", "optimise.looped", `the design network has loops, so flows follow the sizes: sizes were found by repeated fixed-flow optimisation and checked by the engine; the gap bound holds for the flows of the proposal only`));
  }
  const after = snapshot(best.doc, best.view, options, prices);
  const { solved } = best;
  const exact = solved.exact && !view.looped;
  const gap = exact ? 0 : Number.isFinite(solved.lowerBound) && solved.objective > 0 ? Math.max(0, (solved.objective - solved.lowerBound) / solved.objective) : null;
  const changes = doc.pipes.flatMap((p, i) => (best!.doc.pipes[i]!.size !== p.size ? [{ id: p.id, from: p.size, to: best!.doc.pipes[i]!.size, lengthM: p.lengthM }] : []));
  return {
    ...base,
    sizes: Object.fromEntries(best.doc.pipes.map((p) => [p.id, p.size])),
    cost: after.cost,
    after,
    feasible: true,
    findings,
    changes,
    method: solved.method,
    exact,
    gap,
  };
}

function solve(problem: Problem): Solved {
  return solveTreeDp(problem) ?? solveBranchAndBound(problem, 400_000, problem.pipes.some((p) => p.drawn < 0) ? null : Int32Array.from(problem.pipes, (p) => p.drawn));
}

function objectiveOf(s: Snapshot, options: OptimiseOptions): number {
  return options.objective === "life-cost" ? s.lifeCost! : s.cost;
}

/** The problem with extra margin on pumps found short at the proposal's own flows (looped networks). */
function tightened(p: Problem, extra: Map<string, number>): Problem {
  if (extra.size === 0) return p;
  return { ...p, groups: p.groups.map((g) => ({ ...g, limitKpa: g.limitKpa - (extra.get(`${g.mode}:${g.pumpId}`) ?? 0) })) };
}

/** The document with each free pipe at its chosen size (free pipes have no diameter override to drop). */
function applyChoice(doc: Schematic, ex: Extraction, choice: Int32Array): Schematic {
  const to = new Map<number, string>();
  ex.freeIndex.forEach((i, f) => to.set(i, ex.problem.pipes[f]!.options[choice[f]!]!.size));
  return { ...doc, pipes: doc.pipes.map((p, i) => (to.has(i) && to.get(i) !== p.size ? { ...p, size: to.get(i)! } : p)) };
}

/** A pump whose circuits exceed its limit even with every pipe at its least drop: the index circuit named. */
function headShortfall(p: Problem, view: EngineView): Finding | null {
  const lo = lowestHeads(p);
  const g = p.groups.findIndex((grp, k) => lo[k]! > grp.limitKpa + FEAS_TOL_KPA);
  return g < 0 ? null : infeasibleFinding(p, view, "not feasible even with every pipe at its largest offered size", g);
}

function infeasibleFinding(p: Problem, view: EngineView, why: string, group?: number): Finding {
  const lo = lowestHeads(p);
  const g = group ?? lo.reduce((b, v, k) => (v - p.groups[k]!.limitKpa > lo[b]! - p.groups[b]!.limitKpa ? k : b), 0);
  const grp = p.groups[g]!;
  // the index circuit: the one with the largest drop at the least drops
  let index = -1;
  let worst = -Infinity;
  p.circuits.forEach((c, j) => {
    if (c.group !== g) return;
    let v = c.fixedKpa;
    for (let t = 0; t < c.pipes.length; t++) v += Math.min(...p.pipes[c.pipes[t]!]!.options.map((o) => c.sign[t]! * o.dp[grp.mode]!));
    if (v > worst) {
      worst = v;
      index = j;
    }
  });
  const circuit = p.circuits[index];
  const mode = view.runs[grp.mode]!.result.mode;
  const load = circuit?.load ?? "?";
  return finding(
    "error",
    "optimise.infeasible",
    `${why}: the index circuit of ${load} (pump ${grp.pumpId}, ${mode} mode) needs at least ${worst.toFixed(1)} kPa, but the pump gives ${grp.limitKpa.toFixed(1)} kPa at its design flow after the margin — a stronger pump, or sizes the price list does not offer, are needed`,
    [load, grp.pumpId],
  );
}

/** Info on the pipes the optimiser did not touch, and why. */
function keptNotes(doc: Schematic, ex: Extraction): Finding[] {
  const out: Finding[] = [];
  const by = (s: string) => doc.pipes.filter((_, i) => ex.status[i] === s).map((p) => p.id);
  const noFlow = by("no-flow");
  const override = by("override");
  if (noFlow.length > 0) out.push(finding("info", "optimise.kept-no-flow", `${noFlow.length} pipe${noFlow.length > 1 ? "s" : ""} with no design flow (vessel, safety-valve and accessory legs, the bypass) keep their drawn size: their bore follows their own rules, not velocity or pump head`, noFlow));
  if (override.length > 0) out.push(finding("info", "optimise.kept-override", `${override.length} pipe${override.length > 1 ? "s" : ""} with a given inner diameter keep their size`, override));
  return out;
}

export type { PriceList };
