/**
 * Plant-room checks that need only the topology and the design data:
 * zones that can all shut with no other path for the heat source, strainer and
 * isolation valves at the heat source, frost protection, impossible pressures.
 * Strainer and isolation are looked for on the chain from the heat source to
 * the first real branch, where dead-end sub-trees (no circulating flow) are
 * not branches (network/circulating.ts).
 */
import { freezingPointC, type FluidSpec } from "@/lib/hydraulics/fluids";
import { walkChain } from "@/lib/hydraulics/network/chains";
import { circulatingAdjacency } from "@/lib/hydraulics/network/circulating";
import { components, type NetworkModel } from "@/lib/hydraulics/network/model";
import type { Schematic } from "@/lib/schematic/schema";
import type { Findings } from "./finding";

export function plantFindings(doc: Schematic, model: NetworkModel, f: Findings): void {
  // Walk the circulating network only: a tee whose branch leads only to
  // accessories, vessels or drain cocks (however many tees deep) is not a
  // branch, so the walk carries on to the strainer / isolation valve beyond it.
  const adj = circulatingAdjacency(model);
  const zones = doc.parts.filter((p) => p.type === "zone-valve");
  for (const [k, l] of model.links.entries()) {
    if (l.role !== "heat-source") continue;
    const ret = walkChain(model, adj, l.from, k).parts;
    const flow = walkChain(model, adj, l.to, k).parts;
    if (!ret.some((p) => p.type === "strainer" || p.type === "magnetic-filter")) {
      f.warning("heat-source.no-strainer", `${l.id}: no strainer or filter on its return before the first branch`, [l.id]);
    }
    const missing = [
      ...(flow.some((p) => p.type === "isolation-valve") ? [] : ["flow"]),
      ...(ret.some((p) => p.type === "isolation-valve") ? [] : ["return"]),
    ];
    if (missing.length) {
      f.warning("heat-source.no-isolation", `${l.id}: no isolation valve on its ${missing.join(" and ")} before the first branch`, [l.id]);
    }
    if (zones.length > 0) {
      // With every zone valve shut, is there still a path from flow back to return (bypass, header, open zone)?
      const open = model.links.filter(
        (m) => m.role !== "heat-source" && !(m.role === "link" && model.partById.get(m.id)!.type === "zone-valve"),
      );
      const comp = components(model.nodeCount, open);
      if (comp[l.from] !== comp[l.to]) {
        f.warning(
          "zones.can-all-shut",
          `${l.id}: when every zone valve is shut there is no path for its flow (add a dp-bypass valve, an open circuit or a buffer)`,
          [l.id, ...zones.map((z) => z.id)],
        );
      }
    }
  }
  const { design } = doc;
  if (design.coldFillPressureBar >= design.safetyValveBar) {
    f.error(
      "input.fill-pressure",
      `design: cold fill ${design.coldFillPressureBar} bar is not below the safety valve's ${design.safetyValveBar} bar`,
      [],
      ["design.coldFillPressureBar", "design.safetyValveBar"],
    );
  }
  for (const sv of doc.parts) {
    if (sv.type === "safety-valve" && sv.props.setBar !== design.safetyValveBar) {
      f.warning("safety-valve.setting", `${sv.id}: set at ${sv.props.setBar} bar, the design says ${design.safetyValveBar} bar`, [sv.id], ["design.safetyValveBar"]);
    }
  }
  const outdoor = doc.parts.filter((p) => p.type === "heat-pump");
  if (outdoor.length > 0) {
    let fp: number | null = null;
    try {
      fp = freezingPointC(doc.fluid as FluidSpec);
    } catch {
      fp = null;
    }
    const ids = outdoor.map((p) => p.id);
    const tMin = design.minOutdoorTemperatureC;
    if (fp !== null && tMin !== null && fp > tMin) {
      f.warning(
        "fluid.frost-protection",
        `${doc.fluid.kind} freezes at ${fp.toFixed(1)} °C, above the site's ${tMin} °C: protect the outdoor circuit (glycol, frost valves)`,
        ids,
        ["design.minOutdoorTemperatureC", "fluid.kind"],
      );
    } else if (doc.fluid.kind === "water" && tMin === null) {
      f.info(
        "fluid.frost-protection",
        "plain water in a heat-pump circuit: the outdoor pipes need frost protection (glycol or anti-freeze valves); state the minimum outdoor temperature in Design conditions to have it checked",
        ids,
        ["design.minOutdoorTemperatureC"],
      );
    }
  }
}
