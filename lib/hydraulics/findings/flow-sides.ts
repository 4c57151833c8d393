/**
 * Which side of the circuit each port sits on, flow (hot) or return (cold), as
 * the drawing shows it, and whether each part with a flow direction agrees.
 *
 * Cut every part that changes the water's temperature — heat sources (return →
 * flow), loads (flow → return), a buffer's or header's passes — and the
 * dp-bypasses (shut at design); what stays joined by pipes, pumps and valves is
 * one piece at one temperature (pumps and valves do not heat or cool the water).
 * Each port of those parts votes for the side it is named for (flow port, or a
 * buffer's primary or secondary flow: flow; return port: return) on its piece.
 * A piece takes the side most of its ports say (none on a tie); a part whose
 * ports sit more on the wrong sides than the right ones is piped the wrong way
 * round. The majority decides, so one reversed radiator among others, or one
 * reversed heat source among its radiators, is the one named. A fixed bypass
 * or mixing path joins flow and return into one piece, whose votes cancel:
 * no verdict there (design flows decide for heat sources, direction.ts).
 * A rule of common practice (flow and return are kept apart, each part joined
 * to the side its connection is named for), no published source.
 */
import { components, type LinkRole, type NetworkModel } from "@/lib/hydraulics/network/model";

/** Side each through-link's from- and to-port should be on: +1 flow (hot), −1 return (cold). */
const EXPECTED: Partial<Record<LinkRole, readonly [number, number]>> = {
  "heat-source": [-1, 1], // return → flow
  load: [1, -1], // flow → return
  "header-primary": [1, -1], // p1 primary flow in → p2 primary return out
  "header-secondary": [-1, 1], // p4 secondary return in → p3 secondary flow out
};
/** Links that are not inside a piece: the voters above, a header's other passes, dp-bypasses. */
const CUT: ReadonlySet<LinkRole> = new Set(["heat-source", "load", "header-primary", "header-secondary", "header-top", "header-bottom", "bypass"]);

export interface FlowSides {
  /**
   * By link index, for heat sources, loads and header passes: +1 where its ports sit more on the
   * sides they are named for than on the wrong ones, −1 where more on the wrong ones, 0 where the
   * drawing does not say (a tie, or both ports in one piece); NaN for other links.
   */
  score: Float64Array;
  /** By node: its piece (one representative node per piece). */
  piece: Int32Array;
}

export function flowSides(model: NetworkModel): FlowSides {
  const { links, nodeCount } = model;
  const piece = components(nodeCount, links.filter((l) => !CUT.has(l.role)));
  const votes = new Float64Array(nodeCount);
  for (const l of links) {
    const e = EXPECTED[l.role];
    if (!e) continue;
    votes[piece[l.from]!]! += e[0];
    votes[piece[l.to]!]! += e[1];
  }
  const side = (n: number) => Math.sign(votes[piece[n]!]!);
  const score = Float64Array.from(links, (l) => {
    const e = EXPECTED[l.role];
    return e ? Math.sign(side(l.from) * e[0] + side(l.to) * e[1]) : NaN;
  });
  return { score, piece };
}
