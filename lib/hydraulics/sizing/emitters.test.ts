/**
 * Every load is reported in `emitters` and in `scenarios[].emitters`, not only
 * radiators (contract: emitters list; checker found UFH loops, fan coils and
 * heat loads missing).
 * - UFH: EN 1264-2 basic characteristic q = 8.92·(θ_F,m − θ_i)^1.1 W/m²
 *   (references.md §9: 100 W/m² at 9 K; 29 °C occupied-zone surface limit).
 *   Without floor area: the load its design flow carries at ΔT, ok null, an
 *   info finding saying so.
 * - fan-coil / heat-load: fixed loads, output at design flow = heat load.
 * - scenarios: output = ṁ·cp·ΔT capped by the load (first-law balance at the
 *   design ΔT; common practice for a fixed-ΔT load).
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import type { Results } from "@/lib/schematic/results";
import { resultsSchema } from "@/lib/schematic/results";
import { perTest } from "@/lib/hydraulics/testing/per-test";

function run(doc: unknown): Results {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  resultsSchema.parse(r.results);
  return r.results;
}
const millbrook = () =>
  JSON.parse(fs.readFileSync(path.resolve(__dirname, "../../../db/seeds/data/millbrook-hall.json"), "utf8")) as {
    parts: { id: string; type: string; props: Record<string, unknown> }[];
  };

/** The demo hall with its UFH loops' floor areas removed: the "not checked" path. */
function millbrookWithoutFloorAreas() {
  const doc = millbrook();
  for (const p of doc.parts) if (p.type === "ufh-loop") delete p.props.floorAreaM2;
  return doc;
}

describe("UFH loops in the Millbrook demo with the seeded 11 m² floors", () => {
  it("each floor can give its 800 W (EN 1264-2: 11 m² × 8.92·9^1.1 ≈ 1100 W at the 29 °C limit)", () => {
    const r = run(millbrook());
    for (const id of ["ufh1", "ufh2", "ufh3", "ufh4"]) {
      const e = r.emitters.find((x) => x.id === id)!;
      expect(e.outputAtDesignW).toBeCloseTo(800, 6);
      expect(e.ok).toBe(true);
    }
    expect(r.findings.some((f) => f.code === "emitter.ufh-not-checked")).toBe(false);
  });
});

describe("UFH loops in the Millbrook demo (no floor area given)", () => {
  const sized = perTest(() => run(millbrookWithoutFloorAreas()));
  const ufh = ["ufh1", "ufh2", "ufh3", "ufh4"];

  it("design emitters list every loop: output = heat its design flow carries at ΔT (= 800 W), ok not checked", () => {
    const r = sized();
    for (const id of ufh) {
      const e = r.emitters.find((x) => x.id === id);
      expect(e, id).toBeDefined();
      expect(e!.outputAtDesignW).toBeCloseTo(800, 6);
      expect(e!.heatLoadW).toBe(800);
      expect(e!.ok).toBeNull();
    }
    const f = r.findings.find((x) => x.code === "emitter.ufh-not-checked")!;
    expect(f.severity).toBe("info");
    expect(f.refs).toEqual(ufh);
  });

  it("'only zv3 open' (the meeting-room UFH zone): every loop has flow and a nonzero output ≤ its load", () => {
    const r = sized();
    const s = r.scenarios.find((x) => x.name === "only zv3 open")!;
    expect(s.converged).toBe(true);
    for (const id of ufh) {
      const e = s.emitters.find((x) => x.id === id)!;
      expect(e, id).toBeDefined();
      expect(e.flowM3h!).toBeGreaterThan(0);
      expect(e.outputW!).toBeGreaterThan(0);
      expect(e.outputW!).toBeLessThanOrEqual(800 + 1e-6);
      expect(e.returnTemperatureC!).toBeLessThan(45);
    }
    // radiators of the shut zones give nothing
    expect(s.emitters.find((x) => x.id === "rad-h1")!.outputW).toBe(0);
  });

  it("scenario output = ṁ·cp·ΔT capped by the load (heat balance at the loop)", () => {
    const r = sized();
    const s = r.scenarios.find((x) => x.name === "all zones open")!;
    const rho = r.fluid.densityKgM3!;
    const cp = r.fluid.specificHeatJkgK!;
    for (const id of ufh) {
      const e = s.emitters.find((x) => x.id === id)!;
      const mcp = ((e.flowM3h! / 3600) * rho * cp);
      const inletC = e.returnTemperatureC! + e.outputW! / mcp;
      expect(e.outputW!).toBeCloseTo(Math.min(800, mcp * 5, mcp * (inletC - 20)), 6);
    }
  });
});

describe("UFH with a floor area: EN 1264-2 check", () => {
  const withArea = (areaM2: number) => {
    const d = millbrook();
    for (const p of d.parts) if (p.type === "ufh-loop") p.props = { ...p.props, floorAreaM2: areaM2 };
    return run(d);
  };

  it("800 W on 12 m² (67 W/m² → surface ≈ 26.2 °C ≤ 29 °C): output 800 W, ok", () => {
    const r = withArea(12);
    const e = r.emitters.find((x) => x.id === "ufh1")!;
    expect(e.outputAtDesignW).toBeCloseTo(800, 6);
    expect(e.ok).toBe(true);
    expect(r.findings.some((f) => f.code === "emitter.ufh-not-checked")).toBe(false);
    expect(r.findings.some((f) => f.code === "emitter.undersized" && f.refs.includes("ufh1"))).toBe(false);
  });

  it("800 W on 6 m² needs 133 W/m²: capped at 6 × 8.92·9^1.1 ≈ 600 W (29 °C limit), not ok, finding", () => {
    const r = withArea(6);
    const e = r.emitters.find((x) => x.id === "ufh1")!;
    const hand = 6 * 8.92 * 9 ** 1.1; // 29 °C surface in a 20 °C room (mean water 42.5 °C is above it)
    expect(hand).toBeCloseTo(600.1, 0);
    expect(e.outputAtDesignW!).toBeCloseTo(hand, 6);
    expect(e.ok).toBe(false);
    const f = r.findings.find((x) => x.code === "emitter.undersized" && x.refs.includes("ufh1"))!;
    expect(f.message).toMatch(/EN 1264/);
  });
});

describe("fan coil and heat load", () => {
  it("reported in emitters (output = heat load at design flow) and in scenarios", () => {
    const d = smallSystem();
    d.parts = d.parts.map((p) =>
      p.id === "r2" ? { id: "r2", type: "fan-coil", props: { heatLoadW: 500, kv: 1 } } : p.id === "r1" ? { id: "r1", type: "heat-load", props: { heatLoadW: 1000, kv: 1 } } : p,
    );
    const r = run(d);
    expect(r.emitters).toEqual(
      expect.arrayContaining([
        { id: "r1", outputAtDesignW: 1000, heatLoadW: 1000, ok: true },
        { id: "r2", outputAtDesignW: 500, heatLoadW: 500, ok: true },
      ]),
    );
    const s = r.scenarios.find((x) => x.name === "all zones open")!;
    for (const [id, load] of [["r1", 1000], ["r2", 500]] as const) {
      const e = s.emitters.find((x) => x.id === id)!;
      expect(e.flowM3h!).toBeGreaterThan(0);
      expect(e.outputW!).toBeGreaterThan(0);
      expect(e.outputW!).toBeLessThanOrEqual(load + 1e-6);
    }
  });
});
