/**
 * Fresh ids for new parts and pipes: a short type prefix plus the next free
 * number ("rad7", "p31"). One generator per command keeps a batch (paste,
 * duplicate) free of clashes without rescanning the document per id.
 */
import type { PartType, Schematic } from "@/lib/schematic";

export const idPrefix: Record<PartType, string> = {
  "heat-pump": "hp", boiler: "blr", pump: "pump", "zone-valve": "zv", "diverter-valve": "dv",
  "dp-bypass-valve": "bp", "balancing-valve": "bv", "isolation-valve": "iso", "check-valve": "cv",
  strainer: "str", "magnetic-filter": "mag", "heat-meter": "hm", tee: "t", manifold: "mf", "buffer-vessel": "buf",
  "low-loss-header": "llh", cylinder: "cyl", radiator: "rad", "ufh-loop": "ufh", "fan-coil": "fc",
  "heat-load": "load", "expansion-vessel": "ev", "safety-valve": "sv", "air-vent": "av",
  "drain-cock": "dc", "pressure-gauge": "pg", "temperature-sensor": "ts", "filling-loop": "fl",
};

export const PIPE_PREFIX = "p";

export function idGenerator(doc: Pick<Schematic, "parts" | "pipes">): (prefix: string) => string {
  const used = new Set<string>();
  for (const p of doc.parts) used.add(p.id);
  for (const p of doc.pipes) used.add(p.id);
  const next = new Map<string, number>();
  return (prefix) => {
    let n = next.get(prefix) ?? 1;
    while (used.has(`${prefix}${n}`)) n++;
    const id = `${prefix}${n}`;
    used.add(id);
    next.set(prefix, n + 1);
    return id;
  };
}
