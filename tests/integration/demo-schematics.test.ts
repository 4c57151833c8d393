/**
 * The three demo documents (db/seeds/data) are what a new user sees first:
 * they must calculate cleanly. Each calculates ok, every simulated scenario
 * converges, there is no `error` finding and no heat-source strainer /
 * isolation complaint (both demos have a strainer and isolation valves on the
 * heat-source circuit, with the vessel, filling loop and drain cock teed off
 * the return), every radiator meets its room's load at the design
 * temperatures (EN 442), every pump duty is ok, and the "with 40 L buffer"
 * variant holds more water than "bypass only" (it adds a 40 L buffer).
 */
import fs from "node:fs";
import path from "node:path";
import { beforeEach, describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics";
import { resultsSchema, type Results } from "@/lib/schematic/results";

const dir = path.join(process.cwd(), "db/seeds/data");
const FILES = ["millbrook-hall.json", "orchard-end-bypass-only.json", "orchard-end-buffer-40l.json"];

/** Sized inside the tests (a describe's beforeEach runs as part of each test), never while the file is collected. */
function run(file: string): Results {
  const r = calculate(JSON.parse(fs.readFileSync(path.join(dir, file), "utf8")));
  if (!r.ok) throw new Error(`${file}: ${JSON.stringify(r.issues)}`);
  resultsSchema.parse(r.results);
  return r.results;
}

describe.each(FILES)("demo schematic %s", (file) => {
  let r: Results;
  beforeEach(() => {
    r = run(file);
  });
  const doc = JSON.parse(fs.readFileSync(path.join(dir, file), "utf8")) as { parts: { id: string; type: string }[] };

  it("calculates ok", () => {
    expect(r.ok).toBe(true);
    expect(r.modes.some((m) => m.mode === "heating")).toBe(true);
  });

  it("every scenario converges", () => {
    expect(r.scenarios.length).toBeGreaterThan(0);
    expect(r.scenarios.filter((s) => !s.converged).map((s) => s.name)).toEqual([]);
  });

  it("no error findings", () => {
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
  });

  it("no heat-source.no-strainer / heat-source.no-isolation", () => {
    const codes = r.findings.map((f) => f.code);
    expect(codes).not.toContain("heat-source.no-strainer");
    expect(codes).not.toContain("heat-source.no-isolation");
  });

  it("every radiator meets its load", () => {
    const radiators = doc.parts.filter((p) => p.type === "radiator").map((p) => p.id);
    expect(radiators.length).toBeGreaterThan(0);
    for (const id of radiators) {
      const e = r.emitters.find((x) => x.id === id);
      expect(e, id).toBeDefined();
      expect(e!.ok, id).toBe(true);
      expect(e!.outputAtDesignW!, id).toBeGreaterThanOrEqual(e!.heatLoadW!);
    }
  });

  it("every pump ok", () => {
    const pumps = r.modes.flatMap((m) => m.pumps ?? (m.pump ? [m.pump] : []));
    expect(pumps.length).toBeGreaterThan(0);
    for (const p of pumps) expect(p.ok, `${p.id}: required ${p.requiredHeadKpa} kPa, available ${p.availableHeadKpa} kPa`).toBe(true);
  });
});

describe("Orchard End variants", () => {
  it("'with 40 L buffer' holds more system water than 'bypass only'", () => {
    const withBuffer = run("orchard-end-buffer-40l.json");
    const bypassOnly = run("orchard-end-bypass-only.json");
    const buffer = withBuffer.volume.systemL!;
    const bypass = bypassOnly.volume.systemL!;
    expect(buffer).toBeGreaterThan(bypass);
    expect(withBuffer.expansionVessel!.systemVolumeL!).toBeGreaterThan(bypassOnly.expansionVessel!.systemVolumeL!);
  });
});
