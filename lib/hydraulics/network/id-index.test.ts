/** IdIndex against a Map built from the same ids (its documented equivalent). */
import { describe, expect, it } from "vitest";
import { IdIndex } from "./id-index";

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
});
