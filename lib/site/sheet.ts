/**
 * The site sheet of an issued revision: every pipe and part once, grouped by circuit.
 *
 * Circuits come from the kept results (modes[].circuits: each load's path from its pump
 * and back). A pipe or part on one circuit only is listed under that circuit; one that
 * several circuits share is listed under "Shared runs" of the pump that drives them
 * (the first pump, when circuits of several pumps share it); one on no circuit (legs to
 * the vessel, safety valve, vents, drains) under "Plant and accessories". Each group
 * keeps the order the circuit's path meets its pipes and parts, flow leg first.
 */
import { splitPortRef, type Pipe, type Results, type Schematic } from "@/lib/schematic";
import { balancingTargets } from "./balancing";
import { partName } from "./names";
import { partCaution, partSettings } from "./settings";
import type { PartRow, PipeRow, SiteGroup, SiteRow } from "./types";

const fittingWords: Record<string, [string, string]> = {
  elbow: ["elbow", "elbows"], bend: ["bend", "bends"], teeRun: ["tee (run)", "tees (run)"],
  teeBranch: ["tee (branch)", "tees (branch)"], reducer: ["reducer", "reducers"],
};

export function fittingsText(fittings: Pipe["fittings"]): string {
  return Object.entries(fittings)
    .filter(([, n]) => typeof n === "number" && n > 0)
    .map(([k, n]) => `${n} ${fittingWords[k]?.[n === 1 ? 0 : 1] ?? k}`)
    .join(", ");
}

function pipeRow(pipe: Pipe, names: Map<string, string>, results: Results | null): PipeRow {
  const end = (ref: string) => names.get(splitPortRef(ref).partId) ?? splitPortRef(ref).partId;
  const r = results?.modes.find((m) => m.mode === "heating")?.pipes.find((x) => x.id === pipe.id)
    ?? results?.modes.flatMap((m) => m.pipes).find((x) => x.id === pipe.id && x.flowM3h);
  return {
    kind: "pipe", id: pipe.id, runs: `${end(pipe.from)} → ${end(pipe.to)}`, material: pipe.material, size: pipe.size,
    lengthM: pipe.lengthM, fittings: fittingsText(pipe.fittings), flowM3h: r?.flowM3h ?? null, velocityMps: r?.velocityMps ?? null,
  };
}

export function groupsOf(doc: Schematic, results: Results | null): SiteGroup[] {
  const circuits = results?.modes.flatMap((m) => m.circuits) ?? [];
  const loadsOf = new Map<string, Set<string>>(); // element → loads whose path meets it
  for (const c of circuits) for (const id of c.path) (loadsOf.get(id) ?? loadsOf.set(id, new Set()).get(id)!).add(c.load);
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const placed = new Set<string>();
  const groups: SiteGroup[] = [];
  const seenLoads = new Set<string>();
  const pumps = [...new Set(circuits.map((c) => c.pump ?? "none"))];
  for (const pump of pumps) {
    const mine = circuits.filter((c) => (c.pump ?? "none") === pump && !seenLoads.has(c.load));
    mine.forEach((c) => seenLoads.add(c.load));
    const shared: string[] = [];
    for (const c of mine) for (const id of c.path) if ((loadsOf.get(id)?.size ?? 0) > 1 && !placed.has(id)) { placed.add(id); shared.push(id); }
    if (shared.length) groups.push({ id: `shared:${pump}`, title: `Shared runs — ${names.get(pump) ?? "no pump"}`, kind: "shared", rows: shared });
    for (const c of mine) {
      const own = c.path.filter((id) => !placed.has(id));
      own.forEach((id) => placed.add(id));
      if (own.length) groups.push({ id: `circuit:${c.load}`, title: names.get(c.load) ?? c.load, kind: "circuit", rows: own });
    }
  }
  const rest = [...doc.pipes.map((p) => p.id), ...doc.parts.map((p) => p.id)].filter((id) => !placed.has(id));
  if (rest.length) groups.push({ id: "other", title: "Plant and accessories", kind: "other", rows: rest });
  return groups;
}

export function rowsOf(doc: Schematic, results: Results | null): Record<string, SiteRow> {
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const balancing = results ? balancingTargets(doc, results) : undefined;
  const rows: Record<string, SiteRow> = {};
  for (const pipe of doc.pipes) rows[pipe.id] = pipeRow(pipe, names, results);
  for (const part of doc.parts) {
    const row: PartRow = { kind: "part", id: part.id, type: part.type, label: names.get(part.id)!, settings: partSettings(part, doc, results, balancing) };
    const caution = partCaution(part);
    rows[part.id] = caution ? { ...row, caution } : row;
  }
  return rows;
}
