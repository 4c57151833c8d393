import { describe, expect, it } from "vitest";
import { nestsDeeperThan } from "./json-depth";

describe("nestsDeeperThan", () => {
  it("counts arrays and objects, not brackets inside strings", () => {
    expect(nestsDeeperThan('{"a":[1,{"b":[]}]}', 4)).toBe(false);
    expect(nestsDeeperThan('{"a":[1,{"b":[[]]}]}', 4)).toBe(true);
    expect(nestsDeeperThan(JSON.stringify({ s: "[[[[[[[[[[{{{{{{{" }), 1)).toBe(false);
    expect(nestsDeeperThan(JSON.stringify({ s: 'quote \\" then [[[[' }), 1)).toBe(false);
  });

  it("stops at the limit on thousands of levels", () => {
    expect(nestsDeeperThan("[".repeat(100_000), 64)).toBe(true);
    expect(nestsDeeperThan(`${"[".repeat(64)}${"]".repeat(64)}`, 64)).toBe(false);
  });
});
