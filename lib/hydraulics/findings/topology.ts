/**
 * Findings about how the schematic is put together, before any numbers:
 * unconnected parts and ports, ports with more than one pipe, missing heat
 * source / pump / expansion vessel / safety valve, pump curves that rise.
 */
import { partRegistry, portsOf } from "@/lib/schematic/parts";
import { pumpCurveIssues } from "@/lib/hydraulics/pumps/curve";
import type { Schematic } from "@/lib/schematic/schema";
import type { NetworkModel } from "@/lib/hydraulics/network/model";
import type { Findings } from "./finding";

export function topologyFindings(doc: Schematic, model: NetworkModel, f: Findings): void {
  for (const part of doc.parts) {
    const ports = portsOf(part);
    const used = ports.filter((port) => (model.pipesAtPort.get(`${part.id}.${port}`)?.length ?? 0) > 0);
    const role = partRegistry[part.type].role;
    if (used.length === 0) {
      f.warning("part.unconnected", `${part.id}: no pipe is connected to it`, [part.id]);
    } else if (role !== "junction" && role !== "header" && used.length < ports.length) {
      const open = ports.filter((p) => !used.includes(p));
      f.warning("part.open-port", `${part.id}: port${open.length > 1 ? "s" : ""} ${open.join(", ")} not connected`, [part.id]);
    }
    for (const port of ports) {
      const pipes = model.pipesAtPort.get(`${part.id}.${port}`) ?? [];
      if (pipes.length > 1) {
        f.error("port.two-pipes", `${part.id}.${port}: ${pipes.length} pipes meet at one port (use a tee)`, [part.id, ...pipes]);
      }
    }
    const curve = part.type === "pump" ? part.props.curve : part.type === "heat-pump" || part.type === "boiler" ? part.props.pumpCurve : null;
    if (curve) {
      for (const issue of pumpCurveIssues(curve)) {
        const code = issue.startsWith("head rises") ? "pump.curve-rising" : "pump.curve-invalid";
        f.warning(code, `${part.id}: pump curve ${issue}`, [part.id]);
      }
    }
  }
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
