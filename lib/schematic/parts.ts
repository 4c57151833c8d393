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
  /** Words installers search the parts bin with (besides the label). */
  keywords?: string;
}

const link = (label: string, group: PartGroup = "pumps and valves", keywords?: string): PartTypeInfo => ({
  label,
  group,
  keywords,
  role: "link",
  ports: ["a", "b"],
  through: ["a", "b"],
});
const accessory = (label: string, keywords?: string): PartTypeInfo => ({
  label,
  keywords,
  group: "accessories",
  role: "accessory",
  ports: ["connection"],
});
const load = (label: string, keywords?: string, ports: [string, string] = ["flow", "return"]): PartTypeInfo => ({
  label,
  keywords,
  group: "emitters and cylinder",
  role: "load",
  ports,
  through: ports,
});
const source = (label: string, keywords?: string): PartTypeInfo => ({
  label,
  keywords,
  group: "heat sources",
  role: "heat-source",
  ports: ["flow", "return"],
  through: ["return", "flow"],
});
const header = (label: string, keywords?: string): PartTypeInfo => ({
  label,
  keywords,
  group: "vessels and headers",
  role: "header",
  ports: ["p1", "p2", "p3", "p4"],
});

export const partRegistry: Record<PartType, PartTypeInfo> = {
  "heat-pump": source("Heat pump", "ashp air source monobloc outdoor unit hp"),
  boiler: source("Boiler", "gas oil combi system heat source"),
  pump: { label: "Pump", group: "pumps and valves", role: "pump", ports: ["in", "out"], through: ["in", "out"], keywords: "circulator circulating pump" },
  "zone-valve": link("Zone valve", undefined, "2-port two port motorised motorized valve actuator"),
  "diverter-valve": { label: "Diverter valve", group: "pumps and valves", role: "diverter", ports: ["ab", "a", "b"], keywords: "3-port three port diverting mid-position dhw priority" },
  "dp-bypass-valve": { ...link("Differential-pressure bypass valve", undefined, "bypass dp adv automatic pressure relief prv"), role: "bypass" },
  "balancing-valve": link("Balancing valve", undefined, "double regulating drv commissioning lockshield"),
  "isolation-valve": link("Isolation valve", undefined, "ball valve service valve gate shut-off stop"),
  "check-valve": link("Check valve", undefined, "non-return nrv one-way"),
  strainer: link("Strainer", "accessories", "y-strainer filter mesh screen"),
  "magnetic-filter": link("Magnetic filter / dirt separator", "accessories", "filter magnetic magnetite dirt separator sludge debris cleaner"),
  "heat-meter": link("Heat meter", "accessories", "energy meter flow meter mid rhi"),
  tee: { label: "Tee", group: "accessories", role: "junction", ports: ["a", "b", "c"], keywords: "branch junction t-piece" },
  manifold: { label: "Manifold", group: "vessels and headers", role: "junction", ports: ["common"], keywords: "ufh underfloor distribution" },
  "buffer-vessel": header("Buffer vessel", "buffer tank thermal store 4-pipe volume"),
  "low-loss-header": header("Low-loss header", "llh hydraulic separator neutraliser"),
  cylinder: load("Hot-water cylinder", "dhw domestic hot water tank store coil unvented", ["coilFlow", "coilReturn"]),
  radiator: load("Radiator", "rad panel emitter"),
  "ufh-loop": load("Underfloor loop", "ufh underfloor floor heating circuit"),
  "fan-coil": load("Fan coil", "fan convector emitter"),
  "heat-load": load("Heat load", "room zone emitter"),
  "expansion-vessel": { label: "Expansion vessel", group: "vessels and headers", role: "vessel", ports: ["connection"], keywords: "expansion vessel pressure vessel diaphragm sealed system" },
  "safety-valve": accessory("Safety valve", "prv pressure relief valve discharge"),
  "air-vent": accessory("Air vent", "aav automatic air vent bleed"),
  "drain-cock": accessory("Drain cock", "drain off valve"),
  "pressure-gauge": accessory("Pressure gauge", "manometer gauge"),
  "temperature-sensor": accessory("Temperature sensor", "thermometer probe stat"),
  "filling-loop": accessory("Filling loop", "fill filling link mains cold feed"),
};

/** Port names as written on screen: buffers and headers by what each connects, coils in words. */
const headerPorts: Record<string, string> = { p1: "primary flow", p2: "primary return", p3: "secondary flow", p4: "secondary return" };
const wordPorts: Record<string, string> = { coilFlow: "coil flow", coilReturn: "coil return", ab: "AB" };

export function portLabel(type: PartType, port: string): string {
  const info = partRegistry[type];
  if (info.role === "header" && headerPorts[port]) return headerPorts[port];
  if (type === "manifold" && /^p\d+$/.test(port)) return `outlet ${port.slice(1)}`;
  if ((type === "tee" || info.role === "link" || info.role === "bypass") && (port === "a" || port === "b" || port === "c")) return port.toUpperCase();
  return wordPorts[port] ?? port.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
}

/** "buf.p1" → "buf primary flow" for messages and lists. */
export function portRefLabel(doc: { parts: { id: string; type: PartType }[] }, ref: string): string {
  const { partId, port } = splitPortRef(ref);
  const part = doc.parts.find((p) => p.id === partId);
  return part ? `${partId} ${portLabel(part.type, port)}` : ref;
}

/** Does a parts-bin search match this type (label, keywords, type name)? */
export function partMatches(type: PartType, query: string): boolean {
  const words = query.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const info = partRegistry[type];
  const hay = `${type} ${info.label} ${info.keywords ?? ""}`.toLowerCase();
  return words.every((w) => hay.includes(w));
}

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

/**
 * portsOf as one shared, frozen list per part type (a manifold's per outlet
 * count), for loops over thousands of parts that only read it: no array per part.
 */
const sharedPortLists = new Map<string, readonly string[]>();
export function sharedPortsOf(part: Pick<Part, "type" | "props">): readonly string[] {
  const key = part.type === "manifold" ? `manifold/${(part.props as { outlets: number }).outlets}` : part.type;
  let ports = sharedPortLists.get(key);
  if (!ports) sharedPortLists.set(key, (ports = Object.freeze(portsOf(part))));
  return ports;
}

/** Split "partId.port" at its last dot. */
export function splitPortRef(ref: string): { partId: string; port: string } {
  const dot = ref.lastIndexOf(".");
  return { partId: ref.slice(0, dot), port: ref.slice(dot + 1) };
}
