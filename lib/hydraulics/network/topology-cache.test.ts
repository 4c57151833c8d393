import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateGridWithPipes } from "@/lib/schematic/generate-grid";
import { prepare, prepareUncached } from "./gga";
import { clearTopologyCache } from "./topology-cache";

const topo = (n: number, links: [number, number][], fixed: number[]) => ({
  nodeCount: n,
  from: Int32Array.from(links, (l) => l[0]),
  to: Int32Array.from(links, (l) => l[1]),
  fixed: Uint8Array.from({ length: n }, (_, i) => (fixed.includes(i) ? 1 : 0)),
});

describe("symbolic factorisation kept per topology", () => {
  it("gives the same prepared structure for the same topology, a new one for another", () => {
    clearTopologyCache();
    const a = prepare(topo(4, [[0, 1], [1, 2], [2, 3], [3, 0]], [0]));
    expect(prepare(topo(4, [[0, 1], [1, 2], [2, 3], [3, 0]], [0]))).toBe(a);
    expect(prepare(topo(4, [[0, 1], [1, 2], [2, 3], [3, 1]], [0]))).not.toBe(a);
    expect(prepare(topo(4, [[0, 1], [1, 2], [2, 3], [3, 0]], [1]))).not.toBe(a);
    // the kept structure is the one the symbolic phase makes
    const fresh = prepareUncached(topo(4, [[0, 1], [1, 2], [2, 3], [3, 0]], [0]));
    expect(Array.from(a.unknownOf)).toEqual(Array.from(fresh.unknownOf));
    expect(Array.from(a.linkSlot)).toEqual(Array.from(fresh.linkSlot));
  });
  it("does not change any result: a looped grid calculated cold and from the memo answers the same bytes", () => {
    const doc = generateGridWithPipes(300);
    clearTopologyCache();
    const cold = JSON.stringify(calculate(doc));
    const warm = JSON.stringify(calculate(doc));
    expect(warm).toBe(cold);
  });
});
