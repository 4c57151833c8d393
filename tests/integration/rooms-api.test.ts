import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as getRooms, PUT as putRooms } from "@/app/api/v1/projects/[projectId]/rooms/route";
import { POST as importRooms } from "@/app/api/v1/projects/[projectId]/rooms/import/route";
import { GET as flowTemperature } from "@/app/api/v1/projects/[projectId]/rooms/flow-temperature/route";
import { POST as postDraft } from "@/app/api/v1/projects/[projectId]/drafts/route";
import { GET as getEmitters, PUT as putEmitters } from "@/app/api/v1/projects/[projectId]/emitter-list/route";
import { GET as getSchematic } from "@/app/api/v1/schematics/[schematicId]/route";
import { pgPool } from "@/lib/auth/pg-pool";
import { db } from "@/lib/db";
import { calculate } from "@/lib/hydraulics";
import { flowTemperatureCheck } from "@/lib/rooms/flow-temperature";
import { importEmitterCsv } from "@/lib/rooms/emitter-list-csv";
import { cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture, type Fixture } from "./helpers/fixture";

// The rooms API against the real PostgreSQL: each route called as Next would, with real
// sessions, on a throw-away project of the demo firm.
const data = (f: string) => fs.readFileSync(path.join(process.cwd(), "db/seeds/data", f), "utf8");
const demoCsv = data("orchard-end-rooms.csv");
const plant = JSON.parse(data("orchard-end-plant.json"));
let f: Fixture;
let designer = "";
let trainee = "";
let reviewer = "";

beforeAll(async () => {
  f = await makeFixture();
  designer = (await cookieFor("designer"))!;
  trainee = (await cookieFor("trainee"))!;
  reviewer = (await cookieFor("reviewer"))!;
});
afterAll(async () => {
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

type Call = (req: Request, ctx: { params: Promise<{ projectId: string }> }) => Promise<Response>;
async function call(handler: Call, o: { path?: string; method?: string; cookie?: string; json?: unknown; csv?: string | Uint8Array; type?: string }) {
  // a same-origin browser call: the request guard refuses a cookie without this app's Origin
  const headers = new Headers({ cookie: o.cookie ?? designer, origin: "http://test" });
  let body: BodyInit | undefined;
  if (o.json !== undefined) { headers.set("content-type", "application/json"); body = JSON.stringify(o.json); }
  if (o.csv !== undefined) { headers.set("content-type", o.type ?? "text/csv"); body = o.csv as BodyInit; }
  const res = await handler(new Request(`http://test/api/v1/projects/${f.projectId}${o.path ?? ""}`, { method: o.method ?? "GET", headers, body }), { params: Promise.resolve({ projectId: f.projectId }) });
  const text = await res.text();
  let parsed: any = text;
  try { parsed = JSON.parse(text); } catch { /* CSV */ }
  return { status: res.status, body: parsed, type: res.headers.get("content-type") ?? "" };
}
const saved = async () => (await call(getRooms as Call, { path: "/rooms" })).body;

describe("GET/PUT …/rooms", () => {
  it("starts empty; a wrong room is refused with its path and nothing is saved", async () => {
    expect(await saved()).toMatchObject({ rooms: [], lockVersion: 0 });
    const bad = await call(putRooms as Call, { path: "/rooms", method: "PUT", json: { rooms: [{ name: "Hall", roomTemperatureC: 18, heatLossW: -5 }, { name: "hall", roomTemperatureC: 60, heatLossW: 100 }] } });
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual(expect.arrayContaining([
      { path: "rooms[0].heatLossW", message: "rooms[0].heatLossW: must be more than 0 W" },
      { path: "rooms[1].roomTemperatureC", message: "rooms[1].roomTemperatureC: must be between 5 and 35 °C" },
      expect.objectContaining({ path: "rooms[1].name", message: expect.stringMatching(/'hall' is used by room 1 too/) }),
    ]));
    expect((await saved()).rooms).toEqual([]);
  });
  it("saves with the lock version seen, and answers 409 with the current one to a stale writer", async () => {
    const rooms = [{ name: "Hall", roomTemperatureC: 18, heatLossW: 650, emitter: { kind: "radiator", outputAtDt50W: 1200 } }];
    const first = await call(putRooms as Call, { path: "/rooms", method: "PUT", json: { rooms, lockVersion: 0 } });
    expect(first.status).toBe(200);
    expect(first.body.rooms[0].emitter).toEqual({ kind: "radiator", outputAtDt50W: 1200, exponentN: 1.3, waterVolumeL: null });
    const stale = await call(putRooms as Call, { path: "/rooms", method: "PUT", json: { rooms, lockVersion: 0 } });
    expect(stale).toMatchObject({ status: 409, body: { currentLockVersion: first.body.lockVersion } });
  });
  it("a reviewer reads but may not change them", async () => {
    expect((await call(getRooms as Call, { path: "/rooms", cookie: reviewer })).status).toBe(200);
    const r = await call(putRooms as Call, { path: "/rooms", method: "PUT", cookie: reviewer, json: { rooms: [] } });
    expect(r.status).toBe(403);
    expect(r.body.error).toMatch(/Only a project owner or designer can change the rooms/);
  });
});

describe("POST …/rooms/import (text/csv)", () => {
  it("previews the demo CSV without saving; with save=true replaces the rooms", async () => {
    const before = await saved();
    const preview = await call(importRooms as Call, { path: "/rooms/import", method: "POST", csv: demoCsv });
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ saved: false, issues: [] });
    expect(preview.body.rows).toHaveLength(9);
    expect(await saved()).toEqual(before);
    const done = await call(importRooms as Call, { path: "/rooms/import?save=true", method: "POST", csv: demoCsv });
    expect(done.body).toMatchObject({ saved: true });
    expect((await saved()).rooms.map((r: { name: string }) => r.name)).toEqual(["Lounge", "Kitchen-diner", "Hall", "Study", "WC", "Bedroom 1", "Bedroom 2", "Bedroom 3", "Bathroom"]);
  });
  it("a file with problems: every one by line and column, 400 on save, and nothing saved", async () => {
    const before = await saved();
    const csv = "Room,Temperature,Watts\nLounge,21,\"1,450\"\nHall,18,0\n";
    const r = await call(importRooms as Call, { path: `/rooms/import?save=true&mapping=${encodeURIComponent(JSON.stringify({ heatLossW: "Watts" }))}`, method: "POST", csv });
    expect(r.status).toBe(400);
    expect(r.body.issues).toEqual([
      { line: 2, column: "Watts", message: expect.stringMatching(/'1,450' has a comma/) },
      { line: 3, column: "Watts", message: "must be more than 0 W" },
    ]);
    expect(r.body.error).toMatch(/nothing was saved/);
    expect(await saved()).toEqual(before);
  });
  it("refuses a bad mapping, a JSON body (415) and a body over the limit (413)", async () => {
    const m = await call(importRooms as Call, { path: `/rooms/import?mapping=${encodeURIComponent('{"heatLoss":"Watts"}')}`, method: "POST", csv: demoCsv });
    expect(m.status).toBe(400);
    expect(m.body.issues[0]).toMatchObject({ column: "mapping.heatLoss", message: expect.stringMatching(/unknown field/) });
    expect((await call(importRooms as Call, { path: "/rooms/import?mapping=%7Bnot", method: "POST", csv: demoCsv })).status).toBe(400);
    expect((await call(importRooms as Call, { path: "/rooms/import", method: "POST", json: { rooms: [] } })).status).toBe(415);
    expect((await call(importRooms as Call, { path: "/rooms/import", method: "POST", csv: `name,roomTemperatureC,heatLossW\n${"x".repeat(2 * 1024 * 1024)}` })).status).toBe(413);
  });
  it("5,000 rooms: the preview says the limit; saving is refused and nothing changes", async () => {
    const before = await saved();
    const csv = `name,roomTemperatureC,heatLossW\n${Array.from({ length: 5000 }, (_, i) => `Room ${i},20,400`).join("\n")}\n`;
    const preview = await call(importRooms as Call, { path: "/rooms/import", method: "POST", csv });
    expect(preview.body.rows).toHaveLength(500);
    expect(preview.body.issues).toEqual([expect.objectContaining({ line: 502, message: expect.stringMatching(/5,000 rooms; a project holds at most 500/) })]);
    expect((await call(importRooms as Call, { path: "/rooms/import?save=true", method: "POST", csv })).status).toBe(400);
    expect(await saved()).toEqual(before);
  });
  it("reads an older spreadsheet's Windows-1252 file (°, ü) as well as UTF-8", async () => {
    const bytes = new Uint8Array([...Buffer.from("Room,Temperature (", "latin1"), 0xb0, ...Buffer.from("C),Heat loss (W)\nK", "latin1"), 0xfc, ...Buffer.from("che,20,900\n", "latin1")]);
    const r = await call(importRooms as Call, { path: "/rooms/import", method: "POST", csv: bytes });
    expect(r.body.issues).toEqual([]);
    expect(r.body.headers[1]).toBe("Temperature (°C)");
    expect(r.body.rows[0].room.name).toBe("Küche");
  });
  it("exports the saved rooms as CSV that imports back to the same rooms", async () => {
    const csv = await call(getRooms as Call, { path: "/rooms?format=csv" });
    expect(csv.type).toMatch(/text\/csv/);
    const back = await call(importRooms as Call, { path: "/rooms/import", method: "POST", csv: csv.body });
    expect(back.body.rows.map((r: { room: unknown }) => r.room)).toEqual((await saved()).rooms);
  });
});

describe("GET …/rooms/flow-temperature", () => {
  it("names a missing or out-of-range parameter", async () => {
    const r = await call(flowTemperature as Call, { path: "/rooms/flow-temperature?flowC=120" });
    expect(r.status).toBe(400);
    expect(r.body.issues).toEqual([
      { path: "flowC", message: "flowC: must be between 25 and 90 °C" },
      { path: "deltaK", message: "deltaK: is missing (a number)" },
    ]);
  });
  it("answers the check of the saved rooms with the firm's list, as the library computes it", async () => {
    const r = await call(flowTemperature as Call, { path: "/rooms/flow-temperature?flowC=45&deltaK=5" });
    expect(r.status).toBe(200);
    const list = importEmitterCsv(data("fernbank-emitters.csv")).emitters;
    const expected = flowTemperatureCheck((await saved()).rooms, { flowC: 45, deltaTK: 5 }, list);
    expect(r.body.lowestFlowTemperatureC).toBeCloseTo(expected.lowestFlowTemperatureC!, 9);
    expect(r.body.rooms[0]).toMatchObject({ name: "Lounge", suggested: { name: expected.rooms[0]!.suggested!.name } });
    for (const room of r.body.rooms) expect(Object.keys(room)).toEqual(expect.arrayContaining(["name", "outputW", "shortfallW", "neededOutputAtDt50W", "suggested"]));
  });
});

describe("POST …/drafts", () => {
  it("saves a first draft as a new team schematic that sizes with no errors and meets every room", async () => {
    const r = await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant } });
    expect(r.status).toBe(201);
    // no error or warning but the one saying which resistances rest on typical values (no model is named)
    expect(r.body.engineFindings.map((x: { code: string }) => x.code)).toEqual(["input.assumed-values"]);
    const row = await db()("schematics").where({ id: r.body.schematicId }).first();
    expect(row).toMatchObject({ project_id: f.projectId, kind: "team", name: "First draft from rooms" });
    const view = await getSchematic(new Request(`http://test/api/v1/schematics/${row.id}`, { headers: { cookie: designer } }), { params: Promise.resolve({ schematicId: row.id }) });
    const sized = calculate((await view.json()).doc);
    if (!sized.ok) throw new Error("stored draft does not parse");
    expect(sized.results.findings.filter((x) => x.severity === "error")).toEqual([]);
    expect(sized.results.emitters.every((e) => e.ok)).toBe(true);
  });
  it("a second draft gets a free name; a trainee's is a private practice schematic", async () => {
    expect((await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant } })).body.name).toBe("First draft from rooms 2");
    const t = await call(postDraft as Call, { path: "/drafts", method: "POST", cookie: trainee, json: { plant } });
    expect(t.status).toBe(201);
    expect(await db()("schematics").where({ id: t.body.schematicId }).first("kind", "owner_id")).toEqual({ kind: "practice", owner_id: "demo-trainee" });
  });
  it("with variantOf it is listed as a variant of that schematic; another project's id is refused", async () => {
    const r = await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant, variantOf: f.teamSchematicId } });
    expect(r.status).toBe(201);
    expect((await db()("schematics").where({ id: r.body.schematicId }).first("variant_of")).variant_of).toBe(f.teamSchematicId);
    const [other] = await db()("schematics").whereNot({ project_id: f.projectId }).limit(1).pluck("id");
    const bad = await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant, variantOf: other } });
    expect(bad).toMatchObject({ status: 400, body: { issues: [{ path: "variantOf" }] } });
  });
  it("a bad plant: 400 naming each path, no schematic made; a reviewer: 403", async () => {
    const count = async () => Number((await db()("schematics").where({ project_id: f.projectId }).count("* as n"))[0]!.n);
    const before = await count();
    const r = await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant: { ...plant, deltaTK: 0, zones: [{ name: "Z", rooms: ["Attic"] }] } } });
    expect(r.status).toBe(400);
    expect(r.body.issues.map((i: { path: string }) => i.path)).toContain("plant.deltaTK");
    expect((await call(postDraft as Call, { path: "/drafts", method: "POST", json: { nope: 1 } })).status).toBe(400);
    expect((await call(postDraft as Call, { path: "/drafts", method: "POST", cookie: reviewer, json: { plant } })).status).toBe(403);
    expect(await count()).toBe(before);
  });
  it("a heat pump too small for the rooms still draws, with the finding", async () => {
    const r = await call(postDraft as Call, { path: "/drafts", method: "POST", json: { plant: { ...plant, heatSource: { kind: "heat-pump", ratedOutputKw: 4, minFlowM3h: 0.5 } } } });
    expect(r.status).toBe(201);
    expect(r.body.findings.map((x: { code: string }) => x.code)).toContain("draft.heat-source-small");
  });
});

describe("…/emitter-list", () => {
  it("reads the firm's list, as CSV too; a bad CSV is refused by line and column and the list stays", async () => {
    const list = await call(getEmitters as Call, { path: "/emitter-list" });
    expect(list.body.emitters.length).toBe(13);
    expect((await call(getEmitters as Call, { path: "/emitter-list?format=csv" })).type).toMatch(/text\/csv/);
    const bad = await call(putEmitters as Call, { path: "/emitter-list", method: "PUT", csv: "Model,Output at ΔT50 (W)\nP1,abc\n" });
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([{ line: 2, column: "Output at ΔT50 (W)", message: "'abc' is not a number" }]);
    expect((await call(getEmitters as Call, { path: "/emitter-list" })).body.emitters).toEqual(list.body.emitters);
  });
});
