import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { siteRecordsOfRevision } from "@/lib/site/records";
import { callRoute, cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture, type Fixture } from "./helpers/fixture";

// The site sheet's event log against the real PostgreSQL: each event applied once however
// often it is sent, per-event answers, two installers' work kept, the later of a tick and an
// untick winning, bad events refused while the rest of the batch applies, and batch limits.

const events = () => import("@/app/api/v1/schematics/[schematicId]/site/events/route");
const sheet = () => import("@/app/api/v1/schematics/[schematicId]/site/route");

let f: Fixture;
let installer: string;
let owner: string;
const at = (min: number) => new Date(Date.UTC(2026, 4, 4, 9, min)).toISOString();

async function post(cookie: string | null, body: unknown, schematicId = f.teamSchematicId) {
  return callRoute((await events()).POST as never, { method: "POST", path: `/api/v1/schematics/${schematicId}/site/events`, cookie, params: { schematicId }, body });
}
async function read(cookie: string | null) {
  return callRoute((await sheet()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}/site`, cookie, params: { schematicId: f.teamSchematicId } });
}
const tick = (target: string, madeAt: string, kind = "tick") => ({ id: randomUUID(), kind, target, data: {}, madeAt });
const pressureTest = (over: Record<string, unknown> = {}) => ({
  id: randomUUID(), kind: "pressure-test", madeAt: at(70),
  data: { medium: "water", testPressureBar: 4, startPressureBar: 4, endPressureBar: 3.95, startedAt: at(0), endedAt: at(65),
    ambientStartC: 12, ambientEndC: 13, witness: "Site lead (invented)", ...over },
});
const count = async () => Number((await db()("site_events").where({ schematic_id: f.teamSchematicId }).count("* as n"))[0]!.n);

beforeAll(async () => {
  f = await makeFixture({ revisionStatus: "issued" });
  installer = (await cookieFor("installer"))!;
  owner = (await cookieFor("owner"))!;
});
afterAll(async () => {
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

describe("site events", () => {
  it("applies each event once: a resent batch answers duplicate and stores nothing more", async () => {
    const batch = { events: [tick("pri-f1", at(1)), tick("pri-f2", at(2)), tick("pri-f3", at(3)), pressureTest()] };
    const first = await post(installer, batch);
    expect(first.status).toBe(200);
    expect(first.body.results.map((r: { status: string }) => r.status)).toEqual(["applied", "applied", "applied", "applied"]);
    const again = await post(installer, batch);
    expect(again.body.results.map((r: { status: string }) => r.status)).toEqual(["duplicate", "duplicate", "duplicate", "duplicate"]);
    expect(await count()).toBe(4);
    const s = await read(installer);
    expect(s.body.ticks["pri-f2"]).toMatchObject({ ticked: true, by: "Callum Ash", at: at(2) });
    const rec = s.body.records.pressureTests[0];
    expect(rec).toMatchObject({ author: { name: "Callum Ash" }, verdict: { pass: true } });
    expect(rec.verdict.rule.basis).toMatch(/common practice/);
  });

  it("keeps two installers' ticks of different rows, each with its author", async () => {
    await post(installer, { events: [tick("sec-f3", at(10))] });
    await post(owner, { events: [tick("sec-f4", at(10))] });
    const s = await read(installer);
    expect(s.body.ticks["sec-f3"].by).toBe("Callum Ash");
    expect(s.body.ticks["sec-f4"].by).toBe("Rowan Hale");
  });

  it("the later of a tick and an untick of the same row wins, whatever order they arrive in", async () => {
    const untickLater = tick("pri-r1", at(30), "untick");
    const tickEarlier = tick("pri-r1", at(20));
    await post(owner, { events: [untickLater] }); // arrives first, made later
    await post(installer, { events: [tickEarlier] });
    expect((await read(installer)).body.ticks["pri-r1"]).toMatchObject({ ticked: false, at: at(30) });
    await post(installer, { events: [tick("pri-r1", at(40))] });
    expect((await read(installer)).body.ticks["pri-r1"]).toMatchObject({ ticked: true, at: at(40) });
  });

  it("refuses bad events one by one, naming the field, and still applies the rest of the batch", async () => {
    const before = await count();
    const good = tick("pri-r2", at(50));
    const wrongUnit = { id: randomUUID(), kind: "commissioning", madeAt: at(51), data: { readings: [{ kind: "heat-source-flow", value: 2.4, unit: "bar" }] } };
    const wrongKind = { id: randomUUID(), kind: "commissioning", madeAt: at(52), data: { readings: [{ kind: "colour", value: 3, unit: "m" }] } };
    const noSuchPipe = tick("no-such-pipe", at(53));
    const noId = { kind: "tick", target: "pri-r3", data: {}, madeAt: at(54) };
    const wrongPump = { id: randomUUID(), kind: "commissioning", madeAt: at(55), data: { readings: [{ kind: "pump-head", value: 3, unit: "m", target: "zv1" }] } };
    const r = await post(installer, { events: [wrongUnit, good, wrongKind, noSuchPipe, noId, wrongPump] });
    expect(r.status).toBe(200);
    const [a, b, c, d, e, g] = r.body.results;
    expect(a).toMatchObject({ status: "error", issues: [{ path: "data.readings.0.unit" }] });
    expect(b).toMatchObject({ id: good.id, status: "applied" });
    expect(c.error).toMatch(/^data\.readings\.0\.kind: kind must be one of/);
    expect(d.error).toMatch(/^target: no pipe or part "no-such-pipe"/);
    expect(e).toMatchObject({ id: null, status: "error" });
    expect(e.error).toMatch(/^id:/);
    expect(g.error).toMatch(/data\.readings\.0\.target: "zv1" is not a pump/);
    expect(await count()).toBe(before + 1);
  });

  it("limits a batch to 500 events: 10,000 are refused whole with a message, nothing saved", async () => {
    const before = await count();
    const many = Array.from({ length: 10_000 }, (_, i) => tick("pri-r2", new Date(Date.UTC(2026, 4, 4, 10, 0, i % 60)).toISOString()));
    const r = await post(installer, { events: many });
    expect(r.status).toBe(413);
    expect(r.body.error).toMatch(/at most 500 events; this one has 10000\. Nothing was saved/);
    expect(await count()).toBe(before);
  });

  it("a correction is a new record naming the old one; records are never changed in place", async () => {
    const first = pressureTest({ endPressureBar: 3.5 });
    const fix = pressureTest({ endPressureBar: 3.9, corrects: first.id });
    const r = await post(installer, { events: [first, fix, pressureTest({ corrects: randomUUID() })] });
    expect(r.body.results.map((x: { status: string }) => x.status)).toEqual(["applied", "applied", "error"]);
    const recs = await siteRecordsOfRevision(f.revisionId);
    const old = recs.pressureTests.find((p) => p.id === first.id)!;
    expect(old.verdict.pass).toBe(false);
    expect(old.correctedBy).toBe(fix.id);
    expect(recs.pressureTests.find((p) => p.id === fix.id)!.corrects).toBe(first.id);
    await expect(db()("site_events").where({ id: first.id }).update({ data: "{}" })).rejects.toThrow(/never changed/);
  });

  it("commissioning readings come back checked against the design with their deviation", async () => {
    const c = { id: randomUUID(), kind: "commissioning", madeAt: at(80), data: { readings: [
      { kind: "flow-temperature", value: 41, unit: "°C" }, { kind: "safety-valve-test", value: true, target: "sv" },
    ] } };
    expect((await post(installer, { events: [c] })).body.results[0].status).toBe("applied");
    const rec = (await read(installer)).body.records.commissioning.find((x: { id: string }) => x.id === c.id);
    expect(rec.checks[0]).toMatchObject({ ok: false, deviation: "−4.0 K", design: "45.0 °C", tolerance: "±2 K" });
    expect(rec.checks[1].ok).toBe(true);
  });

  it("notes, on the schematic or pinned to a part, come back with their author", async () => {
    const pinned = { id: randomUUID(), kind: "note", target: "ev", madeAt: at(85), data: { text: "Vessel charged before filling (invented note)" } };
    const loose = { id: randomUUID(), kind: "note", madeAt: at(86), data: { text: "Filling loop disconnected" } };
    const empty = { id: randomUUID(), kind: "note", madeAt: at(87), data: { text: "  " } };
    const r = await post(installer, { events: [pinned, loose, empty] });
    expect(r.body.results.map((x: { status: string }) => x.status)).toEqual(["applied", "applied", "error"]);
    expect(r.body.results[2].error).toMatch(/^data\.text: write the note/);
    const notes = (await read(owner)).body.records.notes;
    expect(notes.map((n: { target: string | null; author: { name: string } }) => [n.target, n.author.name])).toEqual([["ev", "Callum Ash"], [null, "Callum Ash"]]);
  });

  it("designers, reviewers and trainees read the sheet but cannot record; nothing is recorded without an issued revision", async () => {
    for (const who of ["designer", "reviewer", "trainee"] as const) {
      const c = await cookieFor(who);
      expect((await read(c)).status).toBe(200);
      const r = await post(c, { events: [tick("pri-f1", at(90))] });
      expect(r.status).toBe(403);
      expect(r.body.error).toMatch(/Only a project owner or installer can record site work/);
    }
    const draftOnly = await makeFixture();
    const r = await post(owner, { events: [tick("pri-f1", at(90))] }, draftOnly.teamSchematicId);
    expect(r.status).toBe(409);
  });
});
