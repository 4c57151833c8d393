/**
 * The engine's design modes for one document, as the optimiser reads them:
 * the same context and mode runs calculate() makes (sizing/mode.ts), and from
 * them each pump's duty, each pipe's design flow and velocity, and whether the
 * design network is a tree (then the flows cannot depend on the sizes).
 */
import { Findings } from "@/lib/hydraulics/findings/finding";
import { components } from "@/lib/hydraulics/network/model";
import { createContext, type EngineContext } from "@/lib/hydraulics/sizing/context";
import { isCut } from "@/lib/hydraulics/sizing/laws";
import { runMode, type ModeRun } from "@/lib/hydraulics/sizing/mode";
import { NO_FLOW_M3H } from "@/lib/hydraulics/network/behaviour";
import type { Schematic } from "@/lib/schematic/schema";

export interface PumpDutyView {
  id: string;
  mode: "heating" | "hot-water";
  designFlowM3h: number | null;
  requiredHeadKpa: number | null;
  availableHeadKpa: number | null;
}

export interface EngineView {
  ctx: EngineContext;
  runs: ModeRun[];
  /** input/fluid errors that stop any sizing (the engine's own findings) */
  errors: Findings["list"];
  pumps: PumpDutyView[];
  /**
   * per doc pipe: flow magnitude per run, 0 below the engine's reporting threshold NO_FLOW_M3H
   * (a shut link leaks ~1e-8 m³/h at 100 kPa: the dp bypass's legs carry nothing in design)
   */
  flowM3h: Float64Array[];
  /** true when some design network has a loop: flows then follow the sizes */
  looped: boolean;
}

export function engineView(doc: Schematic): EngineView {
  const findings = new Findings();
  const ctx = createContext(doc, findings);
  const errors = findings.list.filter((f) => f.severity === "error");
  const runs: ModeRun[] = [];
  if (ctx.fluid !== null && ctx.deltaTK !== null) {
    runs.push(runMode(ctx, "heating"));
    if (doc.parts.some((p) => p.type === "cylinder")) runs.push(runMode(ctx, "hot-water"));
  }
  const pumps = runs.flatMap((r) => r.result.pumps.map((d) => ({ ...d, mode: r.result.mode })));
  const flowM3h = doc.pipes.map((_, i) => {
    const k = ctx.model.pipeLink[i]!;
    return Float64Array.from(runs, (r) => {
      const q = Math.abs(r.solution.q[k]!);
      return q < NO_FLOW_M3H || !Number.isFinite(q) ? 0 : q;
    });
  });
  return { ctx, runs, errors, pumps, flowM3h, looped: runs.some((r) => hasLoop(ctx, r)) };
}

/** Cyclomatic number E − N + C of the links open in the run's design state > 0. */
function hasLoop(ctx: EngineContext, run: ModeRun): boolean {
  const open = ctx.model.links.filter((l) => !isCut(ctx, l, run.solution.state));
  const comp = components(ctx.model.nodeCount, open);
  let c = 0;
  for (let n = 0; n < comp.length; n++) if (comp[n] === n) c++;
  return open.length - ctx.model.nodeCount + c > 0;
}

/** The largest required head over every pump and mode (the index circuit's Δp), kPa. */
export function largestRequiredHead(view: EngineView): number | null {
  let best: number | null = null;
  for (const p of view.pumps) if (p.requiredHeadKpa !== null && (best === null || p.requiredHeadKpa > best)) best = p.requiredHeadKpa;
  return best;
}
