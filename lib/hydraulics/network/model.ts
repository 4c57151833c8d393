/**
 * Network model from a schematic: nodes are ports (all ports of a junction —
 * tee, manifold — share one node), links are pipes and through-parts.
 * A buffer vessel / low-loss header (p1 primary flow in, p2 primary return
 * out, p3 secondary flow out, p4 secondary return in) gets four links:
 * `header-primary` p1→p2 (the common leg), `header-top` p1→p3,
 * `header-bottom` p4→p2 and `header-secondary` p4→p3. Simulating, top, bottom
 * and common leg are near-zero-loss and the secondary pass is shut: the header
 * is one pressure point, primary and secondary are separate loops, and the
 * flows take the physical paths (hot water p1→p3, surplus down the common
 * leg, returns p4→p2), which the temperature mixing needs. In design the
 * primary pass p1→p2 carries the heat-source flow as a fixed demand, the
 * secondary closes through p4→p3, and top and bottom are shut. The
 * topology never changes between modes and scenarios — closed valves become
 * near-zero-conductance links, as EPANET does — so the symbolic factorisation
 * is computed once.
 */
import { partRegistry, sharedPortsOf, splitPortRef } from "@/lib/schematic/parts";
import type { Part, Schematic } from "@/lib/schematic/schema";
import { IdIndex, portIndex } from "@/lib/schematic/id-index";

export type LinkRole =
  | "pipe"
  | "heat-source"
  | "pump"
  | "link"
  | "bypass"
  | "diverter-a"
  | "diverter-b"
  | "load"
  | "header-primary"
  | "header-secondary"
  | "header-top"
  | "header-bottom";

export interface ModelLink {
  /** pipe id or part id (schematic ids only) */
  id: string;
  role: LinkRole;
  from: number;
  to: number;
  /** index into doc.pipes or doc.parts */
  index: number;
}

/**
 * ModelLink made by a constructor, not an object literal: V8 moves literal sites whose
 * objects outlive a minor GC (a model lives through the whole solve) straight to the old
 * generation, and that allocation, with its marking steps, cost 7 % of a 10,000-pipe solve.
 */
class Link implements ModelLink {
  constructor(
    public id: string,
    public role: LinkRole,
    public from: number,
    public to: number,
    public index: number,
  ) {}
}

/** Lookup by id or "part.port" reference: a map's get, its map built only when first asked. */
export interface Lookup<T> {
  get(key: string): T | undefined;
}

/** A Lookup whose map is made by `fill` on the first get (most solves never ask). */
function lazyLookup<T>(fill: (map: Map<string, T>) => void): Lookup<T> {
  let map: Map<string, T> | null = null;
  return {
    get(key) {
      if (!map) fill((map = new Map()));
      return map.get(key);
    },
  };
}

export interface NetworkModel {
  nodeCount: number;
  portNode: Lookup<number>;
  links: ModelLink[];
  linksOfPart: Lookup<number[]>;
  linkOfPipe: Lookup<number>;
  /** by doc.pipes index: the pipe's link (−1 when its ends do not resolve; parse refuses those) */
  pipeLink: Int32Array;
  partById: Lookup<Part>;
  /** pipes attached to each port, "part.port" → pipe ids (built on first use) */
  pipesAtPort: Lookup<string[]>;
  /** every part's ports in one sequence: doc.parts[i]'s port j (portsOf order) is slot portSlot[i] + j */
  portSlot: Int32Array;
  /** by port slot: how many pipe ends name that port */
  endsAtPort: Int32Array;
  /** one fixed-head node per connected component (an expansion vessel where there is one) */
  fixed: Uint8Array;
  component: Int32Array;
}

/** A through-link of a part: its role and the ports it joins, from → to. */
type LinkSpec = readonly [LinkRole, string, string];

const HEADER_LINKS: readonly LinkSpec[] = [
  ["header-primary", "p1", "p2"],
  ["header-secondary", "p4", "p3"],
  ["header-top", "p1", "p3"],
  ["header-bottom", "p4", "p2"],
];
const FIXED_LINKS: Partial<Record<string, readonly LinkSpec[]>> = {
  "heat-source": [["heat-source", "return", "flow"]],
  pump: [["pump", "in", "out"]],
  link: [["link", "a", "b"]],
  bypass: [["bypass", "a", "b"]],
  diverter: [
    ["diverter-a", "ab", "a"],
    ["diverter-b", "ab", "b"],
  ],
  header: HEADER_LINKS,
};
/** A load's one link by part type (its through ports differ by type), made on first use. */
const loadLinks = new Map<string, readonly LinkSpec[]>();

/** The part's through-links (none for junctions, vessels and accessories): shared constant lists, nothing made per part. */
function partLinks(part: Part): readonly LinkSpec[] {
  const info = partRegistry[part.type];
  if (info.role !== "load") return FIXED_LINKS[info.role] ?? [];
  let specs = loadLinks.get(part.type);
  if (!specs) loadLinks.set(part.type, (specs = [["load", info.through![0], info.through![1]]]));
  return specs;
}

export function buildModel(doc: Schematic): NetworkModel {
  const vesselNodes: number[] = [];
  // A part's ports get consecutive nodes in portsOf order (a junction: one node),
  // so a port's node is its part's first node plus the port's index: no
  // "part.port" key is built or hashed per port (ids are unique: parse checks that).
  const firstNode = new Int32Array(doc.parts.length);
  const portLists: (readonly string[])[] = new Array(doc.parts.length);
  const junction = new Uint8Array(doc.parts.length);
  const portSlot = new Int32Array(doc.parts.length + 1);
  let nodeCount = 0;
  const ids = new Array<string>(doc.parts.length);
  doc.parts.forEach((part, index) => {
    ids[index] = part.id;
    const role = partRegistry[part.type].role;
    const ports = sharedPortsOf(part);
    portLists[index] = ports;
    portSlot[index + 1] = portSlot[index]! + ports.length;
    firstNode[index] = nodeCount;
    if (role === "junction") {
      junction[index] = 1;
      nodeCount++;
    } else nodeCount += ports.length;
    if (role === "vessel") vesselNodes.push(firstNode[index]! + ports.indexOf("connection"));
  });
  const partIndex = new IdIndex(ids);
  const slotPart = new Int32Array(portSlot[doc.parts.length]!);
  for (let index = 0; index < doc.parts.length; index++) slotPart.fill(index, portSlot[index]!, portSlot[index + 1]!);
  const nodeOfSlot = (slot: number): number => {
    const index = slotPart[slot]!;
    return firstNode[index]! + (junction[index] ? 0 : slot - portSlot[index]!);
  };
  const nodeOf = (index: number, port: string): number | undefined => {
    const j = portLists[index]!.indexOf(port);
    return j < 0 ? undefined : nodeOfSlot(portSlot[index]! + j);
  };
  /** The slot of the port a "part.port" reference names, −1 when there is none. */
  const slotOf = (ref: string): number => {
    // the last dot by charCodeAt: String#lastIndexOf is a runtime call, not compiled inline
    let dot = ref.length - 1;
    while (dot >= 0 && ref.charCodeAt(dot) !== 46) dot--;
    const index = dot < 0 ? -1 : partIndex.prefixOf(ref, dot);
    if (index < 0) return -1;
    // the port matched in place (its name is the ref's tail): no string cut per pipe end
    const j = portIndex(portLists[index]!, ref, dot + 1);
    return j < 0 ? -1 : portSlot[index]! + j;
  };
  const portNode: Lookup<number> = {
    get(ref) {
      const slot = slotOf(ref);
      return slot < 0 ? undefined : nodeOfSlot(slot);
    },
  };
  // sized once: pushing 10,000s of links grew and copied the array many times
  let partLinkCount = 0;
  for (let index = 0; index < doc.parts.length; index++) partLinkCount += partLinks(doc.parts[index]!).length;
  const links = new Array<ModelLink>(partLinkCount + doc.pipes.length);
  let linkCount = 0;
  doc.parts.forEach((part, index) => {
    const specs = partLinks(part);
    for (let i = 0; i < specs.length; i++) {
      const [role, a, b] = specs[i]!;
      links[linkCount++] = new Link(part.id, role, nodeOf(index, a)!, nodeOf(index, b)!, index);
    }
  });
  const pipeLink = new Int32Array(doc.pipes.length).fill(-1);
  const endsAtPort = new Int32Array(slotPart.length);
  for (let index = 0; index < doc.pipes.length; index++) {
    const pipe = doc.pipes[index]!;
    const a = slotOf(pipe.from);
    const b = slotOf(pipe.to);
    if (a >= 0) endsAtPort[a]!++;
    if (b >= 0) endsAtPort[b]!++;
    if (a < 0 || b < 0) continue; // parse has rejected this already
    pipeLink[index] = linkCount;
    links[linkCount++] = new Link(pipe.id, "pipe", nodeOfSlot(a), nodeOfSlot(b), index);
  }
  links.length = linkCount;
  const partById = lazyLookup<Part>((map) => doc.parts.forEach((part) => map.set(part.id, part)));
  const linkOfPipe = lazyLookup<number>((map) => doc.pipes.forEach((pipe, i) => pipeLink[i]! >= 0 && map.set(pipe.id, pipeLink[i]!)));
  const linksOfPart = lazyLookup<number[]>((map) =>
    links.forEach((l, k) => {
      if (l.role === "pipe") return;
      const ids = map.get(l.id);
      if (ids) ids.push(k);
      else map.set(l.id, [k]);
    }),
  );
  const pipesAtPort = lazyLookup<string[]>((map) => {
    for (const pipe of doc.pipes) {
      for (const end of [pipe.from, pipe.to]) {
        const list = map.get(end);
        if (list) list.push(pipe.id);
        else map.set(end, [pipe.id]);
      }
    }
  });
  const component = components(nodeCount, links);
  const fixed = new Uint8Array(nodeCount);
  const hasFixed = new Set<number>();
  for (const n of vesselNodes) {
    const c = component[n]!;
    if (!hasFixed.has(c)) {
      fixed[n] = 1;
      hasFixed.add(c);
    }
  }
  for (let n = 0; n < nodeCount; n++) {
    const c = component[n]!;
    if (!hasFixed.has(c)) {
      fixed[n] = 1;
      hasFixed.add(c);
    }
  }
  return { nodeCount, portNode, links, linksOfPart, linkOfPipe, pipeLink, partById, pipesAtPort, portSlot, endsAtPort, fixed, component };
}

/** Connected components by union–find with path halving (Tarjan 1975). */
export function components(nodeCount: number, links: readonly { from: number; to: number }[]): Int32Array {
  const parent = new Int32Array(nodeCount);
  for (let i = 0; i < nodeCount; i++) parent[i] = i;
  const find = (x: number) => {
    while (parent[x] !== x) {
      parent[x] = parent[parent[x]!]!;
      x = parent[x]!;
    }
    return x;
  };
  for (const l of links) {
    const a = find(l.from);
    const b = find(l.to);
    if (a !== b) parent[a] = b;
  }
  const out = new Int32Array(nodeCount);
  for (let i = 0; i < nodeCount; i++) out[i] = find(i);
  return out;
}

export { splitPortRef };

/** Compressed adjacency (CSR): links at node n are list[start[n] .. start[n+1]). */
export interface Adjacency {
  start: Int32Array;
  list: Int32Array;
}

export function adjacency(
  nodeCount: number,
  links: readonly { from: number; to: number }[],
  include: (k: number) => boolean = () => true,
): Adjacency {
  const start = new Int32Array(nodeCount + 1);
  const keep = new Uint8Array(links.length);
  for (let k = 0; k < links.length; k++) {
    if (!include(k)) continue;
    keep[k] = 1;
    start[links[k]!.from + 1]!++;
    start[links[k]!.to + 1]!++;
  }
  for (let n = 0; n < nodeCount; n++) start[n + 1]! += start[n]!;
  const fill = start.slice(0, nodeCount);
  const list = new Int32Array(start[nodeCount]!);
  for (let k = 0; k < links.length; k++) {
    if (!keep[k]) continue;
    list[fill[links[k]!.from]!++] = k;
    list[fill[links[k]!.to]!++] = k;
  }
  return { start, list };
}
