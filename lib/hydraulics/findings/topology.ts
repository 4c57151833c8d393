/**
 * Findings about how the schematic is put together, before any numbers:
 * unconnected parts and ports, ports with more than one pipe, missing heat
 * source / pump / expansion vessel / safety valve, pump curves that rise.
 */
import { partRegistry, sharedPortsOf } from "@/lib/schematic/parts";
import { pumpCurveIssues } from "@/lib/hydraulics/pumps/curve";
import type { Schematic } from "@/lib/schematic/schema";
import { components, type NetworkModel } from "@/lib/hydraulics/network/model";
import type { Findings } from "./finding";

export function topologyFindings(doc: Schematic, model: NetworkModel, f: Findings): void {
  doc.parts.forEach((part, index) => {
    const ports = sharedPortsOf(part);
    // pipe ends per port counted by the model: no "part.port" key per port
    const base = model.portSlot[index]!;
    const ends = (j: number) => model.endsAtPort[base + j]!;
    let used = 0;
    for (let j = 0; j < ports.length; j++) if (ends(j) > 0) used++;
    const role = partRegistry[part.type].role;
    if (used === 0) {
      f.warning("part.unconnected", `${part.id}: no pipe is connected to it`, [part.id]);
    } else if (role !== "junction" && role !== "header" && used < ports.length) {
      const open = ports.filter((_, j) => ends(j) === 0);
      f.warning("part.open-port", `${part.id}: port${open.length > 1 ? "s" : ""} ${open.join(", ")} not connected`, [part.id]);
    }
    for (let j = 0; j < ports.length; j++) {
      if (ends(j) <= 1) continue;
      const pipes = model.pipesAtPort.get(`${part.id}.${ports[j]}`)!;
      f.error("port.two-pipes", `${part.id}.${ports[j]}: ${pipes.length} pipes meet at one port (use a tee)`, [part.id, ...pipes]);
    }
    const curve = part.type === "pump" ? part.props.curve : part.type === "heat-pump" || part.type === "boiler" ? part.props.pumpCurve : null;
    if (curve) {
      // one finding per code and pump: a curve rising over two segments is one rising curve
      const issues = pumpCurveIssues(curve);
      const rising = issues.filter((m) => m.startsWith("head rises"));
      const invalid = issues.filter((m) => !m.startsWith("head rises"));
      if (rising.length) f.warning("pump.curve-rising", `${part.id}: pump curve ${rising.join("; ")}`, [part.id]);
      if (invalid.length) f.warning("pump.curve-invalid", `${part.id}: pump curve ${invalid.join("; ")}`, [part.id]);
    }
  });
  const of = (...types: string[]) => doc.parts.filter((p) => types.includes(p.type));
  const sources = of("heat-pump", "boiler");
  if (sources.length === 0 && doc.parts.length > 0) f.error("system.no-heat-source", "no heat pump or boiler in the schematic");
  const hasPump = of("pump").length > 0 || sources.some((s) => (s.props as { pumpCurve: unknown }).pumpCurve != null);
  if (!hasPump && doc.parts.length > 0) f.error("system.no-pump", "no pump, and no heat source with its own pump curve: nothing drives the flow");
  if (of("expansion-vessel").length === 0 && doc.parts.length > 0) {
    f.warning("system.no-expansion-vessel", "no expansion vessel: a sealed system needs one (EN 12828)");
  }
  if (of("safety-valve").length === 0 && doc.parts.length > 0) {
    f.warning("system.no-safety-valve", "no safety valve: a sealed system needs one at the heat source (EN 12828)");
  }
}

/**
 * Loads in a piece of the drawing that no heat source reaches (a pumped loop
 * joined to nothing that heats it): hydraulically sized as drawn, but they give
 * no heat. Physical connectivity, valves as drawn or not: a shut valve does not
 * make a circuit unheated, a missing pipe does. One error per such piece.
 */
export function unheatedLoads(model: NetworkModel, f: Findings): Set<string> {
  const out = new Set<string>();
  if (!model.links.some((l) => l.role === "heat-source")) return out; // system.no-heat-source says it once
  const comp = components(model.nodeCount, model.links);
  const heated = new Set(model.links.filter((l) => l.role === "heat-source").map((l) => comp[l.from]!));
  const pieces = new Map<number, { loads: string[]; pumps: string[] }>();
  for (const l of model.links) {
    if ((l.role !== "load" && l.role !== "pump") || heated.has(comp[l.from]!)) continue;
    const piece = pieces.get(comp[l.from]!) ?? { loads: [], pumps: [] };
    pieces.set(comp[l.from]!, piece);
    (l.role === "load" ? piece.loads : piece.pumps).push(l.id);
  }
  for (const { loads, pumps } of pieces.values()) {
    if (loads.length === 0) continue;
    f.error(
      "circuit.no-heat-source",
      `${loads.join(", ")}: no pipe path joins ${loads.length > 1 ? "them" : "it"} to a heat pump or boiler, so ${loads.length > 1 ? "they give" : "it gives"} no heat (output 0)`,
      [...loads, ...pumps],
    );
    for (const id of loads) out.add(id);
  }
  return out;
}
