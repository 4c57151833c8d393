/**
 * Registry of part types: ports, parts-bin group, human label and role in the
 * hydraulic network (contract v1 table). Pure data plus `portsOf`, which
 * resolves prop-dependent port lists (manifold outlets p1…pN).
 */
import type { Part, PartType } from "./schema";

export type PartGroup =
  | "heat sources"
  | "pumps and valves"
  | "vessels and headers"
  | "emitters and cylinder"
  | "accessories";

/**
 * heat-source: link return→flow (with its own pump when it has a curve);
 * pump: link in→out adding head; link: two-port resistance; bypass: dp-bypass;
 * diverter: ab joined to a or b; junction: all ports one node; header: buffer/
 * low-loss header, primary p1,p2 and secondary p3,p4 meeting at one node;
 * load: emitter or cylinder coil (flow→return); vessel: pressure reference;
 * accessory: no flow.
 */
export type PartRole =
  | "heat-source"
  | "pump"
  | "link"
  | "bypass"
  | "diverter"
  | "junction"
  | "header"
  | "load"
  | "vessel"
  | "accessory";

export interface PartTypeInfo {
  label: string;
  group: PartGroup;
  role: PartRole;
  /** Fixed ports; manifolds add p1…pN from props.outlets. */
  ports: readonly string[];
  /** For two-port links: [inlet, outlet] in the drawn flow direction. */
  through?: readonly [string, string];
}

const link = (label: string, group: PartGroup = "pumps and valves"): PartTypeInfo => ({
  label,
  group,
  role: "link",
  ports: ["a", "b"],
  through: ["a", "b"],
});
const accessory = (label: string): PartTypeInfo => ({
  label,
  group: "accessories",
  role: "accessory",
  ports: ["connection"],
});
const load = (label: string, ports: [string, string] = ["flow", "return"]): PartTypeInfo => ({
  label,
  group: "emitters and cylinder",
  role: "load",
  ports,
  through: ports,
});
const source = (label: string): PartTypeInfo => ({
  label,
  group: "heat sources",
  role: "heat-source",
  ports: ["flow", "return"],
  through: ["return", "flow"],
});
const header = (label: string): PartTypeInfo => ({
  label,
  group: "vessels and headers",
  role: "header",
  ports: ["p1", "p2", "p3", "p4"],
});

export const partRegistry: Record<PartType, PartTypeInfo> = {
  "heat-pump": source("Heat pump"),
  boiler: source("Boiler"),
  pump: { label: "Pump", group: "pumps and valves", role: "pump", ports: ["in", "out"], through: ["in", "out"] },
  "zone-valve": link("Zone valve"),
  "diverter-valve": { label: "Diverter valve", group: "pumps and valves", role: "diverter", ports: ["ab", "a", "b"] },
  "dp-bypass-valve": { ...link("Differential-pressure bypass valve"), role: "bypass" },
  "balancing-valve": link("Balancing valve"),
  "isolation-valve": link("Isolation valve"),
  "check-valve": link("Check valve"),
  strainer: link("Strainer", "accessories"),
  "heat-meter": link("Heat meter", "accessories"),
  tee: { label: "Tee", group: "accessories", role: "junction", ports: ["a", "b", "c"] },
  manifold: { label: "Manifold", group: "vessels and headers", role: "junction", ports: ["common"] },
  "buffer-vessel": header("Buffer vessel"),
  "low-loss-header": header("Low-loss header"),
  cylinder: load("Hot-water cylinder", ["coilFlow", "coilReturn"]),
  radiator: load("Radiator"),
  "ufh-loop": load("Underfloor loop"),
  "fan-coil": load("Fan coil"),
  "heat-load": load("Heat load"),
  "expansion-vessel": { label: "Expansion vessel", group: "vessels and headers", role: "vessel", ports: ["connection"] },
  "safety-valve": accessory("Safety valve"),
  "air-vent": accessory("Air vent"),
  "drain-cock": accessory("Drain cock"),
  "pressure-gauge": accessory("Pressure gauge"),
  "temperature-sensor": accessory("Temperature sensor"),
  "filling-loop": accessory("Filling loop"),
};

export const partGroups: readonly PartGroup[] = [
  "heat sources",
  "pumps and valves",
  "vessels and headers",
  "emitters and cylinder",
  "accessories",
];

/** Ports of a part, including the manifold's p1…pN from its props. */
export function portsOf(part: Pick<Part, "type" | "props">): string[] {
  const info = partRegistry[part.type];
  if (part.type === "manifold") {
    const n = (part.props as { outlets: number }).outlets;
    return [...info.ports, ...Array.from({ length: n }, (_, i) => `p${i + 1}`)];
  }
  return [...info.ports];
}

/** Split "partId.port" at its last dot. */
export function splitPortRef(ref: string): { partId: string; port: string } {
  const dot = ref.lastIndexOf(".");
  return { partId: ref.slice(0, dot), port: ref.slice(dot + 1) };
}
