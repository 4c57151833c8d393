import { describe, expect, it } from "vitest";
import { partMatches, partTypes, portLabel } from "./index";

const found = (q: string) => partTypes.filter((t) => partMatches(t, q));

describe("parts-bin search by the words installers use", () => {
  it.each([
    ["filter", ["strainer", "magnetic-filter"]],
    ["magnetic", ["magnetic-filter"]],
    ["dirt separator", ["magnetic-filter"]],
    ["DHW", ["diverter-valve", "cylinder"]],
    ["cylinder", ["cylinder"]],
    ["expansion", ["expansion-vessel"]],
    ["bypass", ["dp-bypass-valve"]],
    ["PRV", ["dp-bypass-valve", "safety-valve"]],
    ["buffer", ["buffer-vessel"]],
    ["circulator", ["pump"]],
  ])("“%s” finds %j", (q, types) => {
    expect(found(q)).toEqual(expect.arrayContaining(types));
    for (const t of found(q)) expect(types).toContain(t);
  });
  it("an empty search shows everything", () => expect(found("  ")).toEqual(partTypes));
});

describe("port names on screen", () => {
  it("buffers and headers by what each connects; coils in words; no camelCase", () => {
    expect(["p1", "p2", "p3", "p4"].map((p) => portLabel("buffer-vessel", p))).toEqual(["primary flow", "primary return", "secondary flow", "secondary return"]);
    expect(portLabel("low-loss-header", "p3")).toBe("secondary flow");
    expect(portLabel("cylinder", "coilFlow")).toBe("coil flow");
    expect(portLabel("manifold", "p2")).toBe("outlet 2");
    for (const t of partTypes) for (const p of ["flow", "return", "coilFlow", "coilReturn", "a", "b", "ab", "in", "out", "p1", "common", "connection"]) {
      expect(portLabel(t, p)).not.toMatch(/[a-z][A-Z]/);
    }
  });
});
