/**
 * Which side of the circuit each pipe is on, for its colour (flow red, return
 * blue — trade convention). The rule, so designers can predict it:
 *
 * 1. Ports that say it: `flow`, `coilFlow` and a header's primary/secondary
 *    flow ports `p1`, `p3` are flow; `return`, `coilReturn`, `p2`, `p4` return.
 * 2. A pipe inherits from connected pipes: parts that pass water straight on
 *    (valves, pumps, tees, manifolds, diverters, accessories, vessels) join
 *    their pipes into one run; heat sources, emitters, the cylinder, headers
 *    and the bypass valve separate runs (they sit between flow and return).
 * 3. A run takes the side most of its ports in rule 1 name; a run with none
 *    falls back to pump ports (`out` flow, `in` return); otherwise it stays
 *    neutral (ink) until it is piped to something that says.
 */
import { partRegistry, splitPortRef, type PartRole, type Schematic } from "@/lib/schematic";

export type PipeSide = "flow" | "return" | "none";

const strong: Record<string, PipeSide> = { flow: "flow", coilFlow: "flow", return: "return", coilReturn: "return" };
const headerPorts: Record<string, PipeSide> = { p1: "flow", p3: "flow", p2: "return", p4: "return" };
const weak: Record<string, PipeSide> = { out: "flow", in: "return" };
const separates = new Set<PartRole>(["heat-source", "load", "header", "bypass"]);

export function pipeSides(doc: Schematic): Map<string, PipeSide> {
  const n = doc.pipes.length;
  const parent = Array.from({ length: n }, (_, i) => i);
  const find = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]!]!;
    return i;
  };
  const roles = new Map(doc.parts.map((p) => [p.id, partRegistry[p.type]?.role]));
  const firstPipeAt = new Map<string, number>();
  const votes = Array.from({ length: n }, () => ({ strong: 0, weak: 0 })); // +flow / −return
  doc.pipes.forEach((pipe, i) => {
    for (const ref of [pipe.from, pipe.to]) {
      const { partId, port } = splitPortRef(ref);
      const role = roles.get(partId);
      if (!role) continue;
      if (separates.has(role)) {
        const side = role === "header" ? headerPorts[port] : strong[port];
        if (side) votes[i]!.strong += side === "flow" ? 1 : -1;
        continue;
      }
      const w = role === "pump" ? weak[port] : undefined;
      if (w) votes[i]!.weak += w === "flow" ? 1 : -1;
      const j = firstPipeAt.get(partId);
      if (j === undefined) firstPipeAt.set(partId, i);
      else parent[find(i)] = find(j);
    }
  });
  const total = new Map<number, { strong: number; weak: number }>();
  votes.forEach((v, i) => {
    const r = find(i);
    const t = total.get(r) ?? { strong: 0, weak: 0 };
    t.strong += v.strong;
    t.weak += v.weak;
    total.set(r, t);
  });
  const out = new Map<string, PipeSide>();
  doc.pipes.forEach((pipe, i) => {
    const t = total.get(find(i))!;
    const score = t.strong !== 0 ? t.strong : t.weak;
    out.set(pipe.id, score > 0 ? "flow" : score < 0 ? "return" : "none");
  });
  return out;
}
