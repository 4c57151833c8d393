/**
 * Part of npm run bench: the first-draft generator (lib/rooms/draft) — wall and CPU time
 * of one draft (drawing plus the engine passes that size it) for the demo house and for
 * generated buildings of 100 and 500 rooms (the per-project limit), 20 zones.
 * Targets: demo house < 1 s, 500 rooms < 10 s (CPU), on the 2-core machine.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { generateDraft } from "@/lib/rooms/draft";

function building(n: number) {
  const rooms = Array.from({ length: n }, (_, i) => ({ name: `Room ${i + 1}`, roomTemperatureC: 20, heatLossW: 300 + (i % 7) * 80, floorAreaM2: 12,
    emitter: { kind: "radiator", outputAtDt50W: 1200 + (i % 5) * 200, exponentN: 1.3 } }));
  const zones = Array.from({ length: Math.min(20, n) }, (_, z) => ({ name: `Zone ${z + 1}`, rooms: rooms.filter((_, i) => i % 20 === z).map((r) => r.name) }));
  const kw = Math.ceil(rooms.reduce((s, r) => s + r.heatLossW, 0) / 1000);
  return { rooms: { rooms }, plant: { heatSource: { kind: "boiler", ratedOutputKw: kw, minFlowM3h: 0 }, flowTemperatureC: 70, deltaTK: 20, zones, hotWaterCylinderL: null, separation: "low-loss-header" } };
}

export function benchDraft(): boolean {
  const data = (f: string) => readFileSync(path.join(process.cwd(), "db/seeds/data", f), "utf8");
  const cases = [
    { name: "demo house (9 rooms)", rooms: JSON.parse(data("orchard-end-rooms.json")), plant: JSON.parse(data("orchard-end-plant.json")), targetMs: 1000 },
    { name: "100 rooms", ...building(100), targetMs: undefined },
    { name: "500 rooms", ...building(500), targetMs: 10_000 },
  ];
  console.log("\nFirst draft: generateDraft() — draw, then size with the engine (one run each after a warm-up of the demo)");
  generateDraft(cases[0]!.rooms, cases[0]!.plant);
  let ok = true;
  for (const c of cases) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    const out = generateDraft(c.rooms, c.plant);
    const wall = performance.now() - t0;
    const u = process.cpuUsage(c0);
    const cpu = (u.user + u.system) / 1000;
    const parts = out.ok ? out.draft.schematic.parts.length : 0;
    const pass = c.targetMs === undefined ? "" : cpu < c.targetMs ? `PASS cpu < ${c.targetMs} ms` : `FAIL cpu < ${c.targetMs} ms`;
    if (c.targetMs !== undefined && !(cpu < c.targetMs)) ok = false;
    console.log(`  ${c.name.padEnd(22)} ${String(parts).padStart(5)} parts  wall ${wall.toFixed(0).padStart(6)} ms  cpu ${cpu.toFixed(0).padStart(6)} ms  ${out.ok ? "" : "REFUSED "}${pass}`);
  }
  return ok;
}
