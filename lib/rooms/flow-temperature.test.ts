import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { en442Output } from "@/lib/hydraulics/emitters";
import { importEmitterCsv } from "./emitter-list-csv";
import { flowTemperatureCheck } from "./flow-temperature";
import { roomsDocSchema, type EmitterEntry, type Room } from "./schema";

const data = (f: string) => fs.readFileSync(path.join(process.cwd(), "db/seeds/data", f), "utf8");
const demoRooms = roomsDocSchema.parse(JSON.parse(data("orchard-end-rooms.json"))).rooms;
const demoList = importEmitterCsv(data("fernbank-emitters.csv")).emitters;
const room = (name: string, roomTemperatureC: number, heatLossW: number, emitter: Room["emitter"]): Room => ({ name, roomTemperatureC, heatLossW, floorAreaM2: null, emitter });
const rad = (outputAtDt50W: number, exponentN = 1.3) => ({ kind: "radiator" as const, outputAtDt50W, exponentN, waterVolumeL: null });

/** Independent bisection on the EN 442 characteristic over the radiator rooms: lowest flow where every room gets its loss. */
function bisectAllMet(rooms: Room[], deltaTK: number): number {
  const ok = (t1: number) => rooms.every((r) => {
    if (r.emitter?.kind !== "radiator" || !(t1 - deltaTK > r.roomTemperatureC)) return false;
    return en442Output({ outputAtDt50W: r.emitter.outputAtDt50W, exponentN: r.emitter.exponentN, flowC: t1, returnC: t1 - deltaTK, roomC: r.roomTemperatureC }) >= r.heatLossW;
  });
  let lo = 0;
  let hi = 200;
  while (hi - lo > 1e-4) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

describe("lowest flow temperature at which every room is met", () => {
  const radiatorRooms = demoRooms.filter((r) => r.emitter?.kind === "radiator");
  it.each([3, 5, 8, 10, 20])("demo radiators at Δt %d K: the solved value agrees with a bisection on the characteristic to 0.1 K", (dt) => {
    const check = flowTemperatureCheck(radiatorRooms, { flowC: 45, deltaTK: dt });
    expect(Math.abs(check.lowestFlowTemperatureC! - bisectAllMet(radiatorRooms, dt))).toBeLessThan(0.1);
  });
  it("every room is met at it and the room that sets it is not met 0.2 K lower", () => {
    const c = flowTemperatureCheck(demoRooms, { flowC: 45, deltaTK: 5 });
    const at = flowTemperatureCheck(demoRooms, { flowC: c.lowestFlowTemperatureC!, deltaTK: 5 });
    expect(at.rooms.every((r) => r.met)).toBe(true);
    const below = flowTemperatureCheck(demoRooms, { flowC: c.lowestFlowTemperatureC! - 0.2, deltaTK: 5 });
    expect(below.rooms.find((r) => r.name === c.limitingRoom)!.met).toBe(false);
  });
  it("no emitter, or a floor that needs a surface above its limit: no temperature meets every room, and the note says why", () => {
    const floor = { kind: "ufh-loop" as const, floorAreaM2: 10, loopLengthM: null, innerDiameterMm: 12, maxSurfaceTemperatureC: 29 };
    // 10 m² at the 29 °C limit in a 20 °C room gives 10·8.92·9^1.1 ≈ 1000 W (EN 1264-2 basic characteristic): 1500 W is out of reach.
    const c = flowTemperatureCheck([room("Snug", 20, 1500, floor), room("Porch", 18, 200, null)], { flowC: 45, deltaTK: 5 });
    expect(c.lowestFlowTemperatureC).toBeNull();
    expect(c.rooms[0]!.note).toMatch(/surface above its 29 °C limit/);
    expect(c.rooms[1]!.note).toMatch(/no emitter/);
  });
});

describe("per room at the design flow", () => {
  // references.md §7 (computed): 45/40/20, n 1.3 → Φ/Φ50 = 0.3538.
  it("output, shortfall and the rating needed follow the EN 442 ratio at 45/40/20 (±1 W)", () => {
    const [r] = flowTemperatureCheck([room("Study", 20, 500, rad(1000))], { flowC: 45, deltaTK: 5 }).rooms;
    expect(Math.abs(r!.outputW - 353.8)).toBeLessThan(1);
    expect(Math.abs(r!.shortfallW - (500 - 353.8))).toBeLessThan(1);
    expect(Math.abs(r!.neededOutputAtDt50W! - 500 / 0.3538)).toBeLessThan(1.5);
    expect(r!.met).toBe(false);
  });
  it("the suggestion is the smallest of the list that meets the room (500 W needs ≥ 1413 W at ΔT 50)", () => {
    const list: EmitterEntry[] = [1000, 2000, 1420, 1400].map((w) => ({ name: `R${w}`, type: "", heightMm: null, lengthMm: null, outputAtDt50W: w, exponentN: 1.3, waterVolumeL: null }));
    const [r] = flowTemperatureCheck([room("Study", 20, 500, rad(1000))], { flowC: 45, deltaTK: 5 }, list).rooms;
    expect(r!.suggested).toMatchObject({ name: "R1420", outputAtDt50W: 1420 });
  });
  it("a room warmer than the return: no output, the whole loss short, no rating can help, and the note says so", () => {
    const [r] = flowTemperatureCheck([room("Sauna", 33, 400, rad(2000))], { flowC: 35, deltaTK: 5 }, demoList).rooms;
    expect(r).toMatchObject({ outputW: 0, shortfallW: 400, met: false, neededOutputAtDt50W: null, suggested: null });
    expect(r!.note).toMatch(/return \(30 °C\) is not above the room's 33 °C/);
  });
  it("the demo rooms at 45 °C: every short radiator room gets a list emitter that gives its loss", () => {
    const c = flowTemperatureCheck(demoRooms, { flowC: 45, deltaTK: 5 }, demoList);
    for (const r of c.rooms.filter((x) => !x.met)) expect(r.suggested!.outputW).toBeGreaterThanOrEqual(r.heatLossW);
  });
});

describe("the chart 35–75 °C", () => {
  it("41 points, never falling, 100 % of rooms from the lowest flow temperature on", () => {
    const c = flowTemperatureCheck(demoRooms, { flowC: 45, deltaTK: 5 });
    expect(c.curve.map((p) => p.flowC)).toEqual(Array.from({ length: 41 }, (_, i) => 35 + i));
    for (let i = 1; i < c.curve.length; i++) {
      expect(c.curve[i]!.roomsMetPercent).toBeGreaterThanOrEqual(c.curve[i - 1]!.roomsMetPercent);
      expect(c.curve[i]!.heatMetPercent).toBeGreaterThanOrEqual(c.curve[i - 1]!.heatMetPercent - 1e-9);
    }
    for (const p of c.curve) expect(p.roomsMetPercent === 100).toBe(p.flowC >= c.lowestFlowTemperatureC!);
  });
});
