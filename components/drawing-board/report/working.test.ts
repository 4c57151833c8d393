/**
 * Every number the sizing report shows opens a working whose own figures
 * reproduce it. Each check below recomputes the reported number from the
 * working's figures with the published formula written out here (Darcy–
 * Weisbach, v = q/A, Re = v·d/ν, circuits in series, the Kv definition, the
 * pump curve read linearly, the affinity laws, EN 12828 Annex D, EN 442-2,
 * Q = m·cp·ΔT) — not with the engine's functions. Run on the three demo
 * schematics and on one with Kvs and water contents left empty (typical values).
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import type { Results, Schematic } from "@/lib/schematic";
import { parseSchematic } from "@/lib/schematic";
import { withPumpInSeries } from "@/lib/hydraulics/testing/small-system";
import * as W from "./working";

const load = (file: string): Schematic => {
  const p = parseSchematic(JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data", file), "utf8")));
  if (!p.ok) throw new Error(file);
  return p.doc;
};
function parsed(doc: unknown): Schematic {
  const p = parseSchematic(doc);
  if (!p.ok) throw new Error("test document does not parse");
  return p.doc;
}
/** Orchard End with the heat pump's Kv, the strainer's Kv and the radiators' water contents left empty. */
function withEmpties(): Schematic {
  const d = load("orchard-end-bypass-only.json");
  return { ...d, parts: d.parts.map((p) => {
    const props = { ...(p.props as Record<string, unknown>) };
    if (p.type === "heat-pump" || p.type === "strainer") props.kv = null;
    if (p.type === "radiator") props.waterVolumeL = null;
    return { ...p, props } as typeof p;
  }) };
}
const docs: [string, Schematic][] = [
  ["Orchard End, bypass only", load("orchard-end-bypass-only.json")],
  ["Orchard End, 40 L buffer", load("orchard-end-buffer-40l.json")],
  ["Millbrook hall", load("millbrook-hall.json")],
  ["Orchard End with empty Kvs and volumes", withEmpties()],
  ["small system, two pumps in series", parsed(withPumpInSeries())],
];

const near = (a: number, b: number | null, rel = 1e-6, abs = 1e-9) => {
  expect(b).not.toBeNull();
  expect(Math.abs(a - b!)).toBeLessThanOrEqual(Math.max(abs, rel * Math.abs(b!)));
};

describe.each(docs)("%s", (_name, doc) => {
  const r = calculate(doc);
  if (!r.ok) throw new Error("calculates");
  const results: Results = r.results;
  const heating = results.modes.find((m) => m.mode === "heating")!;

  it("pipe schedule: flow, velocity (with Re and f) and Δp of every flowing pipe", () => {
    for (const p of heating.pipes.filter((x) => (x.flowM3h ?? 0) !== 0)) {
      const dp = W.pipeDpWorking(doc, results, p.id)!;
      const g = dp.figures!;
      // Darcy–Weisbach: Δp = (f·L/d + ΣK)·ρv²/2
      near(((g.frictionFactor! * g.lengthM!) / (g.innerDiameterMm! / 1000) + g.sumK!) * (g.densityKgM3! * g.velocityMps! ** 2) / 2 / 1000, dp.value, 1e-9);
      const v = W.velocityWorking(doc, results, p.id)!;
      const h = v.figures!;
      const vel = h.flowM3h! / 3600 / ((Math.PI * (h.innerDiameterMm! / 1000) ** 2) / 4);
      near(vel, v.value, 1e-9);
      near((vel * h.innerDiameterMm!) / 1000 / h.kinematicViscosityM2s!, p.reynolds, 1e-9);
      near(h.frictionFactor!, p.frictionFactor, 1e-9);
      const q = W.pipeFlowWorking(doc, results, p.id)!;
      expect(q.value).toBe(p.flowM3h);
      // continuity holds to the network solver's convergence (relative 1e-6), far below the 3 decimals shown
      if (!q.steps!.some((s) => s.label === "on a loop")) near(q.figures!.sumM3h!, Math.abs(p.flowM3h!), 1e-6, 1e-8);
    }
  });

  it("circuits: design flow, Δp (sum of the path), Δp to absorb and balancing Kv", () => {
    for (const c of heating.circuits.filter((x) => x.pressureDropKpa !== null)) {
      const q = W.designFlowWorking(doc, results, c.load)!;
      const g = q.figures!;
      near((g.powerW! / (g.densityKgM3! * g.specificHeatJkgK! * g.deltaTK!)) * 3600, q.value, 1e-9); // q = P/(ρ·cp·ΔT)
      // the path sum equals the head difference once the solver's heads balance: to 1e-3 kPa (shown to 0.01)
      near(W.circuitDpWorking(doc, results, c.load)!.figures!.sumKpa!, c.pressureDropKpa, 1e-6, 1e-3);
      const ex = W.excessWorking(doc, results, c.load)!;
      near(ex.figures!.indexKpa! - ex.figures!.circuitKpa!, c.excessKpa, 1e-9, 1e-9);
      const kv = W.balancingKvWorking(doc, results, c.load);
      if (kv) {
        const k = kv.figures!;
        near(k.flowM3h! * Math.sqrt(k.densityKgM3! / 1000 / (k.excessKpa! / 100)), c.balancingKv, 1e-9); // IEC 60534-1
      }
    }
  });

  it("pump duty: head needed, head available off the curve, and the setting", () => {
    for (const m of results.modes) {
      for (const d of m.pumps) {
        if (d.requiredHeadKpa === null) continue;
        near(W.requiredHeadWorking(doc, results, m, d)!.figures!.maxCircuitKpa!, d.requiredHeadKpa, 1e-9, 1e-9);
        const a = W.availableHeadWorking(doc, results, m, d);
        if (a && d.availableHeadKpa !== null && a.steps!.length === 1) {
          const g = a.figures!;
          near(g.h0! + ((g.flowM3h! - g.q0!) / (g.q1! - g.q0!)) * (g.h1! - g.h0!), d.availableHeadKpa, 1e-9);
        }
        const s = W.pumpSettingWorking(doc, results, m, d);
        if (s && d.speedFraction !== null) near(d.speedFraction ** 2 * s.figures!.headAtQOverN!, d.requiredHeadKpa, 1e-6); // H_n = n²·H(q/n)
      }
    }
  });

  it("bypass, vessel, volumes and hot water", () => {
    if (results.bypass?.recommendedOpeningKpa != null) {
      const need = W.bypassOpeningWorking(doc, results)!.figures!.needKpa!;
      near(Math.max(need * 1.1, need + 2), results.bypass.recommendedOpeningKpa, 1e-9);
    }
    const ev = results.expansionVessel;
    if (ev?.requiredVolumeL != null) {
      const g = W.vesselWorking(doc, results)!.figures!;
      const ve = g.expansionFraction! * g.systemVolumeL!;
      const vwr = Math.max(0.005 * g.systemVolumeL!, 3);
      near(((ve + vwr) * (g.finalPressureBar! + 1)) / (g.finalPressureBar! - g.prechargeBar!), ev.requiredVolumeL, 1e-9); // EN 12828 Annex D
      near(ve, ev.expansionVolumeL, 1e-9);
      near(W.prechargeWorking(doc, results)!.figures!.staticHeightM! / 10 + 0.2, ev.recommendedPrechargeBar, 1e-9);
    }
    near(W.systemVolumeWorking(doc, results)!.figures!.sumL!, results.volume.systemL, 1e-9);
    if (results.volume.minimumL !== null) expect(W.minVolumeWorking(doc, results)!.value).toBe(results.volume.minimumL);
    if (results.hotWater?.reheatMinutes != null) {
      const g = W.reheatWorking(doc, results)!.figures!;
      near(g.energyJ! / g.powerW! / 60, results.hotWater.reheatMinutes, 1e-9); // t = V·ρ·cp·ΔT / P
    }
  });

  it("emitters: EN 442 output of every radiator, every other emitter's output", () => {
    for (const e of results.emitters) {
      const w = W.emitterWorking(doc, results, e.id)!;
      expect(w.value).toBe(e.outputAtDesignW);
      const part = doc.parts.find((p) => p.id === e.id)!;
      if (part.type === "radiator" && e.outputAtDesignW !== null && !Number.isNaN(w.figures!.lmtdK!)) {
        const g = w.figures!;
        near(g.outputAtDt50W! * (g.lmtdK! / g.nominalLmtdK!) ** g.exponentN!, e.outputAtDesignW, 1e-9); // EN 442-2
      }
    }
  });

  it("numbers resting on typical values say so in their working", () => {
    const assumed = new Set(results.assumptions.map((a) => a.ref));
    for (const c of heating.circuits) {
      const w = W.circuitDpWorking(doc, results, c.load);
      if (w && c.restsOn.length > 0) expect(w.assumed!.length).toBe(c.restsOn.length);
      for (const ref of c.restsOn) expect(assumed.has(ref)).toBe(true);
    }
    if (results.volume.restsOn.length > 0) expect(W.systemVolumeWorking(doc, results)!.assumed!.join(" ")).toMatch(/assumed/);
  });
});

it("glycol results cite the glycol tables, water results the IAPWS formulations", () => {
  const water = load("orchard-end-bypass-only.json");
  const glycol = { ...water, fluid: { kind: "propylene-glycol" as const, percentByVolume: 30 } };
  for (const [doc, want, not] of [[water, /IAPWS-IF97/, /ASHRAE/], [glycol, /ASHRAE/, /IAPWS-IF97 region 1 \(IAPWS R7-97\) for density/]] as const) {
    const r = calculate(doc);
    if (!r.ok) throw new Error("calculates");
    const load1 = r.results.modes[0]!.circuits[0]!.load;
    const w = W.designFlowWorking(doc, r.results, load1)!;
    expect(w.source).toMatch(want);
    expect(w.source).not.toMatch(not);
    expect(W.vesselWorking(doc, r.results)!.source).toMatch(want);
  }
});

it("the vessel's final pressure shown is the rule the engine applies (0.9 × p_SV above 5 bar)", () => {
  const base = load("orchard-end-bypass-only.json");
  const doc = { ...base, design: { ...base.design, safetyValveBar: 6, coldFillPressureBar: 1.5 } };
  const r = calculate(doc);
  if (!r.ok) throw new Error("calculates");
  const w = W.vesselWorking(doc, r.results)!;
  expect(w.steps!.find((s) => s.label.startsWith("final pressure"))!.label).toMatch(/0\.9·p_SV/);
  expect(w.figures!.finalPressureBar).toBeCloseTo(5.4, 12);
});
