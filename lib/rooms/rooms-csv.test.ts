import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { readNumber } from "./csv-table";
import { importRoomsCsv, roomsToCsv } from "./rooms-csv";
import { MAX_ROOMS } from "./schema";

const demoCsv = fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-rooms.csv"), "utf8");
const head = "name,roomTemperatureC,heatLossW,floorAreaM2,emitterKind,outputAtDt50W,exponentN";

describe("rooms CSV import", () => {
  it("reads the demo survey: every heading mapped from its human form, nine rooms, no problems", () => {
    const r = importRoomsCsv(demoCsv);
    expect(r.issues).toEqual([]);
    expect(r.mapping).toMatchObject({ name: "Room", roomTemperatureC: "Design temperature (°C)", heatLossW: "Heat loss (W)", outputAtDt50W: "Output at ΔT50 (W)", emitterFloorAreaM2: "Loop floor area (m²)" });
    expect(r.rows.map((x) => x.line)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 10]);
    const kitchen = r.rows[1]!.room!;
    expect(kitchen).toMatchObject({ name: "Kitchen-diner", heatLossW: 1300, emitter: { kind: "ufh-loop", floorAreaM2: 22 } });
    expect(r.rows[0]!.room!.emitter).toMatchObject({ kind: "radiator", outputAtDt50W: 2100, exponentN: 1.3, waterVolumeL: 8.4 });
  });

  it("the demo rooms JSON (for the draft CLI) holds the same rooms as the demo CSV", () => {
    const json = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-rooms.json"), "utf8"));
    expect(importRoomsCsv(demoCsv).rows.map((r) => r.room)).toEqual(json.rooms);
  });

  it("exports what it imports: CSV → rooms → CSV → the same rooms", () => {
    const rooms = importRoomsCsv(demoCsv).rows.map((r) => r.room!);
    const again = importRoomsCsv(roomsToCsv(rooms));
    expect(again.issues).toEqual([]);
    expect(again.rows.map((r) => r.room)).toEqual(rooms);
  });

  it("a missing column is one message on the header line, naming the field", () => {
    const r = importRoomsCsv("Room,Temperature\nLounge,21\nHall,18\n");
    expect(r.issues).toEqual([expect.objectContaining({ line: 1, column: "heatLossW", message: expect.stringMatching(/no column for heatLossW/) })]);
    expect(r.rows.every((x) => x.room === null)).toBe(true);
  });

  it("a column chosen by hand feeds the field", () => {
    const r = importRoomsCsv("Room,Temperature,Watts\nLounge,21,1450\n", { heatLossW: "Watts" });
    expect(r.issues).toEqual([]);
    expect(r.rows[0]!.room).toMatchObject({ heatLossW: 1450, emitter: null });
  });

  it("commas in numbers: quoted → the cell is refused; unquoted → the row has too many values; both by line", () => {
    const r = importRoomsCsv(`${head}\nLounge,21,"1,450",22,radiator,2100,1.3\nHall,18,1,200,9,radiator,1200,1.3\n`);
    expect(r.issues).toContainEqual({ line: 2, column: "heatLossW", message: expect.stringMatching(/'1,450' has a comma/) });
    expect(r.issues).toContainEqual({ line: 3, column: "", message: expect.stringMatching(/8 values where the header has 7 columns/) });
    expect(r.rows.filter((x) => x.room).length).toBe(0);
  });

  it("with semicolons between columns a decimal comma is read (European spreadsheets)", () => {
    const r = importRoomsCsv("name;roomTemperatureC;heatLossW;floorAreaM2\nLounge;20,5;1450;22,4\n");
    expect(r.issues).toEqual([]);
    expect(r.rows[0]!.room).toMatchObject({ roomTemperatureC: 20.5, floorAreaM2: 22.4 });
  });

  it("a heat loss of 0 or below, an unknown emitter, a missing rating and a repeated name: each by line and column", () => {
    const r = importRoomsCsv(`${head}\nA,20,0,,,,\nB,20,-50,,,,\nC,20,500,,towel,600,\nD,20,500,,radiator,,\nA,20,100,,,,\n`);
    const at = (line: number) => r.issues.filter((i) => i.line === line).map((i) => `${i.column}: ${i.message}`);
    expect(at(2)).toEqual(["heatLossW: must be more than 0 W"]);
    expect(at(3)).toEqual(["heatLossW: must be more than 0 W"]);
    expect(at(4)).toEqual([expect.stringMatching(/^emitterKind: 'towel' is not an emitter kind/)]);
    expect(at(5)).toEqual([expect.stringMatching(/^outputAtDt50W: is empty/)]);
    expect(at(6)).toEqual([expect.stringMatching(/^name: 'A' is already the name of the room on line 2/)]);
  });

  it("line numbers count quoted line breaks and skipped blank lines; a byte-order mark is not a heading", () => {
    const r = importRoomsCsv(`\uFEFF${head}\n"Lounge, front",21,1450,,,,\n\n"Hall\nand stairs",18,x,,,,\nStudy,20,500,,,,\n`);
    expect(r.mapping.name).toBe("name");
    expect(r.rows.map((x) => [x.line, x.cells.name])).toEqual([[2, "Lounge, front"], [4, "Hall\nand stairs"], [6, "Study"]]);
    expect(r.issues).toEqual([{ line: 4, column: "heatLossW", message: "'x' is not a number" }]);
  });

  it("5,000 rooms: the first 500 are read and one message says the limit and where reading stopped", () => {
    const lines = Array.from({ length: 5000 }, (_, i) => `Room ${i + 1},20,500,,,,`);
    const r = importRoomsCsv(`${head}\n${lines.join("\n")}\n`);
    expect(r.rows).toHaveLength(MAX_ROOMS);
    expect(r.issues).toEqual([{ line: MAX_ROOMS + 2, column: "", message: expect.stringMatching(/5,000 rooms; a project holds at most 500/) }]);
  });

  it("an empty file and a header without rows say so", () => {
    expect(importRoomsCsv("").issues.map((i) => i.message)).toContainEqual(expect.stringMatching(/the file is empty/));
    expect(importRoomsCsv(`${head}\n`).issues).toEqual([{ line: 2, column: "", message: expect.stringMatching(/no rooms/) }]);
  });
});

describe("readNumber", () => {
  it.each([["1200", ",", 1200], ["20.5", ",", 20.5], ["-3", ",", -3], ["", ",", null], ["20,5", ";", 20.5], ["1e3", ",", 1000]])("%s (columns split by %s) → %s", (t, d, v) => {
    expect(readNumber(t, d)).toEqual({ ok: true, value: v });
  });
  it.each([["1,200", ","], ["1.200,5", ";"], ["12 W", ","], ["abc", ","]])("%s (columns split by %s) is refused with a reason", (t, d) => {
    const r = readNumber(t, d);
    expect(r.ok).toBe(false);
  });
});
