/**
 * No finding repeats: across every document the tests keep on disk or generate — the demo
 * seeds, the published cases, the small test system, generated buildings, each with the faults
 * that once came out twice (a pump curve rising over two segments) — the same code never names
 * the same parts and pipes twice. The property test (calculate.property.test.ts) and the
 * engine contract sweep apply the same check to every random and hand-made document.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { repeatedFindings } from "@/lib/hydraulics/testing/repeated-findings";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import { generateBuilding } from "@/lib/schematic/generate-building";

const root = path.resolve(__dirname, "../../..");
const onDisk = (dir: string) =>
  readdirSync(path.join(root, dir))
    .filter((f) => f.endsWith(".json"))
    .map((f) => [`${dir}/${f}`, JSON.parse(readFileSync(path.join(root, dir, f), "utf8"))] as const)
    .filter(([, doc]) => doc.format === "loopwright/schematic"); // the rooms and plant files beside them are not schematics

function withRisingCurve() {
  const d = smallSystem();
  d.parts.find((p) => p.id === "pump")!.props = { curve: [[0, 10], [1, 20], [2, 30]] };
  return d;
}
function withSourceBelowMinimum() {
  // a minimum flow above the design flow and above the flow with every zone shut: one finding, two situations
  const [, doc] = onDisk("db/seeds/data").find(([name]) => name.endsWith("orchard-end-bypass-only.json"))!;
  const d = structuredClone(doc) as { parts: { type: string; props: Record<string, unknown> }[] };
  for (const p of d.parts) if (p.type === "heat-pump") p.props.minFlowM3h = 50;
  return d;
}

const documents: (readonly [string, unknown])[] = [
  ...onDisk("db/seeds/data"),
  ...onDisk("tests/fixtures/published-cases"),
  ["small system", smallSystem()],
  ["small system, pump curve rising over two segments", withRisingCurve()],
  ["Orchard End, heat-source minimum flow above every flow", withSourceBelowMinimum()],
  ["generated building 3 floors × 4", generateBuilding({ floors: 3, radiatorsPerFloor: 4 })],
  ["generated building 6 floors × 8, 2 risers", generateBuilding({ floors: 6, radiatorsPerFloor: 8, risers: 2 })],
];

describe("no finding repeats (same code, same refs)", () => {
  it.each(documents)("%s", (_name, doc) => {
    const out = calculate(doc);
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    expect(repeatedFindings(out.results.findings)).toEqual([]);
  });

  it("a curve rising over two segments is one pump.curve-rising naming both segments", () => {
    const out = calculate(withRisingCurve());
    if (!out.ok) throw new Error("must calculate");
    const rising = out.results.findings.filter((f) => f.code === "pump.curve-rising");
    expect(rising).toHaveLength(1);
    expect(rising[0]!.message).toMatch(/points 0 and 1 .*points 1 and 2/);
  });

  it("the check itself sees a repeat, whatever the order of the refs", () => {
    expect(repeatedFindings([{ code: "a", refs: ["x", "y"] }, { code: "a", refs: ["y", "x"] }, { code: "a", refs: ["x"] }])).toEqual(["a [x, y]"]);
  });
});
