import { describe, expect, it } from "vitest";
import { partPropsSchemas } from "@/lib/schematic";
import { fieldsOf, issueMessage, parseNumber } from "./schema-fields";

describe("schema fields", () => {
  it("reads labels, units, nullability and enums from the props schemas", () => {
    const rad = fieldsOf(partPropsSchemas.radiator);
    expect(rad.find((f) => f.name === "outputAtDt50W")).toMatchObject({ kind: "number", label: "EN 442 output at ΔT 50 K", unit: "W", nullable: false });
    expect(rad.find((f) => f.name === "deltaTK")).toMatchObject({ unit: "K", nullable: true, nullHint: "design flow − return" });
    expect(rad.find((f) => f.name === "valveKv")).toMatchObject({ label: "Valve Kv", unit: "", nullable: true });
    expect(fieldsOf(partPropsSchemas["diverter-valve"]).find((f) => f.name === "position")).toMatchObject({ kind: "enum", options: ["a", "b"] });
    expect(fieldsOf(partPropsSchemas.pump)[0]).toMatchObject({ kind: "curve" });
    expect(fieldsOf(partPropsSchemas.manifold)[0]).toMatchObject({ integer: true });
    expect(fieldsOf(partPropsSchemas["zone-valve"]).find((f) => f.name === "open")).toMatchObject({ kind: "boolean" });
  });
  it("every part type's fields are ones the form can draw", () => {
    for (const schema of Object.values(partPropsSchemas)) for (const f of fieldsOf(schema)) expect(f.kind).not.toBe("other");
  });
  it("parses typed numbers strictly and words issues", () => {
    // as the user's locale types them (lib/units/read-number.ts): "1,500" is 1500 in en-GB, "1,5" is 1.5 in de-DE
    expect(parseNumber(" 1,500 ", "en-GB")).toBe(1500);
    expect(parseNumber("1,5", "en-GB")).toBeNull();
    expect(parseNumber(" 1,5 ", "de-DE")).toBe(1.5);
    expect(parseNumber("abc")).toBeNull();
    expect(parseNumber("")).toBeNull();
    const r = partPropsSchemas["zone-valve"].safeParse({ kvs: 0 });
    expect(r.success).toBe(false);
    if (!r.success) expect(issueMessage(r.error.issues[0]!, "")).toMatch(/^Must be (more than|at least) 0(\.\d+)?\.$/);
  });
});
