/** IdIndex against a Map and a Set built from the same ids (its documented equivalents); portIndex against indexOf. */
import { describe, expect, it } from "vitest";
import { IdIndex, portIndex } from "./id-index";

describe("IdIndex: ids → position, looked up by a reference's prefix", () => {
  it("finds every id of 500 (the table fills past a quarter, so probes collide) as a Map does", () => {
    const ids = Array.from({ length: 500 }, (_, i) => `p${i}`);
    const index = new IdIndex(ids);
    for (let i = 0; i < ids.length; i++) expect(index.prefixOf(`${ids[i]}.port`, ids[i]!.length)).toBe(i);
  });
  it("a prefix that is no id, a longer or shorter one, and the empty prefix: −1", () => {
    const index = new IdIndex(["boiler", "pump", "t1"]);
    expect(index.prefixOf("boiler2.flow", 7)).toBe(-1);
    expect(index.prefixOf("boil.flow", 4)).toBe(-1);
    expect(index.prefixOf("t12.a", 3)).toBe(-1);
    expect(index.prefixOf(".a", 0)).toBe(-1);
    expect(index.prefixOf("pump.in", 4)).toBe(1);
  });
  it("a repeated id maps to its last position, as Map.set leaves it", () => {
    const ids = ["a", "b", "a"];
    const map = new Map(ids.map((id, i) => [id, i]));
    expect(new IdIndex(ids).prefixOf("a.x", 1)).toBe(map.get("a"));
  });
  it("repeats flags each later occurrence, as a Set of the ids seen so far would", () => {
    const ids = ["a", "b", "a", "c", "b", "a"];
    const seen = new Set<string>();
    const expected = ids.map((id) => (seen.has(id) ? 1 : (seen.add(id), 0)));
    expect([...new IdIndex(ids).repeats]).toEqual(expected);
  });
});

describe("portIndex: the port a reference's tail names", () => {
  it("finds each port as indexOf of the cut tail does, and −1 for a longer, shorter or unknown name", () => {
    const ports = ["flow", "return", "p1", "p10"];
    for (const ref of ["m.flow", "m.return", "m.p1", "m.p10", "m.p", "m.p100", "m.flows", "m.retur", "m."]) {
      const dot = ref.lastIndexOf(".");
      expect(portIndex(ports, ref, dot + 1), ref).toBe(ports.indexOf(ref.slice(dot + 1)));
    }
  });
});
