import fs from "node:fs";
import path from "node:path";
import { describe, expect, it, vi } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { Refused } from "./outcome";
import { Answer, sizeToAnswer } from "./size";

const text = fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8");
const parseOf = (t: string) => vi.fn(() => ({ ok: true as const, value: JSON.parse(t) as unknown }));

describe("sizeToAnswer (results cache in front of the engine)", () => {
  it("answers exactly what the engine answers, and the same bytes again without re-running it", () => {
    const engine = calculate(JSON.parse(text));
    if (!engine.ok) throw new Error("demo document refused");
    const parse = parseOf(text);
    const first = sizeToAnswer(text, parse);
    const again = sizeToAnswer(text, parse);
    expect(first).toBeInstanceOf(Answer);
    expect((first as Answer).results()).toEqual(engine.results);
    expect(again).toBe(first);
    expect(parse).toHaveBeenCalledTimes(1);
  });

  it("a changed document is a new key: sized afresh, with its own numbers", () => {
    const doc = JSON.parse(text);
    doc.pipes[0].lengthM += 7;
    const changed = JSON.stringify(doc);
    const parse = parseOf(changed);
    const a = sizeToAnswer(changed, parse) as Answer;
    expect(parse).toHaveBeenCalledTimes(1);
    const base = (sizeToAnswer(text, parseOf(text)) as Answer).results();
    const p0 = (r: typeof base) => r.modes[0]!.pipes.find((p) => p.id === doc.pipes[0].id)!.pressureDropKpa!;
    expect(p0(a.results())).toBeGreaterThan(p0(base));
  });

  it("a refused document is not kept: asked again, it is checked again and refused again", () => {
    const bad = JSON.stringify({ ...JSON.parse(text), parts: "none" });
    const parse = parseOf(bad);
    const r1 = sizeToAnswer(bad, parse);
    const r2 = sizeToAnswer(bad, parse);
    expect(r1).toBeInstanceOf(Refused);
    expect((r2 as Refused).status).toBe(400);
    expect((r2 as Refused).extra.issues?.[0]?.path).toBe("parts");
    expect(parse).toHaveBeenCalledTimes(2);
  });
});
