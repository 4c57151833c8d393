import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { lucia } from "@/lib/auth/lucia";
import { createSchematic } from "@/db/queries/schematics";
import { putDraftResults } from "@/db/queries/kept-results";
import { calculate, ENGINE_VERSION } from "@/lib/hydraulics/calculate";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import { callRoute, cookieForUser } from "./helpers/call";

// Side by side (issue 10) against the real PostgreSQL and the seeded Orchard End project:
// the API's numbers are the engine's own for each design (checked against `npm run calc`),
// the changes are matched by id, practice variants stay private, bad refs are refused.

const ORCHARD_END = "6a0f3c1e-0000-4000-8000-000000000102";
const TAG = `cmp-${randomUUID().slice(0, 6)}`;
const cookies = new Map<string, string>();
const compare = async (who: string, a: string, b?: string) => {
  const q = new URLSearchParams({ a, ...(b === undefined ? {} : { b }) });
  return callRoute((await import("@/app/api/v1/compare/route")).GET as never, { path: `/api/v1/compare?${q}`, cookie: cookies.get(who) ?? null });
};
const post = async (who: string, projectId: string, body: unknown) =>
  callRoute((await import("@/app/api/v1/projects/[projectId]/schematics/route")).POST as never, {
    method: "POST", path: `/api/v1/projects/${projectId}/schematics`, cookie: cookies.get(who) ?? null, params: { projectId }, body });

const schematicId = async (name: string) => (await db()("schematics").where({ project_id: ORCHARD_END, name }).first("id")).id as string;
const draftOf = async (id: string) => (await db()("schematics").where({ id }).first("draft")).draft;

/** `npm run calc` on a document, as a user would run it: the CLI's own process and parse. */
function calcCli(doc: unknown): any {
  const file = path.join(os.tmpdir(), `${TAG}-${randomUUID().slice(0, 8)}.json`);
  fs.writeFileSync(file, JSON.stringify(doc));
  try {
    return JSON.parse(execFileSync("npm", ["run", "--silent", "calc", "--", file], { encoding: "utf8", maxBuffer: 64 << 20 }));
  } finally {
    fs.rmSync(file, { force: true });
  }
}

/**
 * The metrics read straight off the CLI's results, written out here from the results
 * contract (schematic-format.md) rather than through lib/compare, so a wrong reading there fails.
 */
function expectedFromCli(r: any, doc: any) {
  const heating = r.modes.find((m: any) => m.mode === "heating");
  const allPipes = r.modes.flatMap((m: any) => m.pipes).filter((p: any) => p.velocityMps !== null);
  const fastest = allPipes.reduce((x: any, y: any) => (y.velocityMps > x.velocityMps ? y : x));
  const lengths: Record<string, Record<string, number>> = {};
  for (const p of doc.pipes) lengths[p.material] = { ...lengths[p.material], [p.size]: (lengths[p.material]?.[p.size] ?? 0) + p.lengthM };
  const bySeverity = (s: string) => {
    const list = r.findings.filter((f: any) => f.severity === s);
    return { count: list.length, codes: [...new Set(list.map((f: any) => f.code))].sort() };
  };
  return {
    heatSourceFlowM3h: heating.heatSourceFlowM3h,
    pumpRequiredHeadKpa: heating.pump.requiredHeadKpa,
    pumpAvailableHeadKpa: heating.pump.availableHeadKpa,
    indexCircuit: heating.circuits.find((c: any) => c.index && c.pump === heating.pump.id).load,
    bypassOpeningKpa: r.bypass?.recommendedOpeningKpa ?? null,
    // with no bypass valve, the engine's "all zones shut" scenario says what the heat source gets
    heatSourceFlowAllZonesClosedM3h: r.bypass?.heatSourceFlowAllZonesClosedM3h ?? r.scenarios.find((s: any) => s.name === "all zones shut").heatSourceFlowM3h,
    systemVolumeL: r.volume.systemL,
    minimumVolumeL: r.volume.minimumL,
    bufferRecommended: r.volume.bufferRecommended,
    vesselRequiredL: r.expansionVessel.requiredVolumeL,
    maxVelocityMps: fastest.velocityMps,
    maxVelocityPipe: fastest.id,
    velocityLimitMps: doc.design.maxVelocityMps,
    emitterOutputW: r.emitters.reduce((s: number, e: any) => s + e.outputAtDesignW, 0),
    emitterShortfalls: r.emitters.filter((e: any) => e.ok === false).map((e: any) => e.id),
    pipeLengthM: lengths,
    findings: { error: bySeverity("error"), warning: bySeverity("warning"), info: bySeverity("info") },
    fluidDensityKgM3: r.fluid.densityKgM3,
  };
}

let bypassId = "";
let bufferId = "";
beforeAll(async () => {
  for (const who of ["owner", "designer", "reviewer", "installer", "trainee"]) cookies.set(who, await cookieForUser(`demo-${who}`));
  bypassId = await schematicId("Bypass only");
  bufferId = await schematicId("With 40 L buffer");
});
afterAll(async () => {
  await db()("schematics").where("name", "like", `${TAG}%`).del();
  await db()("project_members").where("user_id", "like", `${TAG}%`).del();
  await db()("users").where("id", "like", `${TAG}%`).del();
});

describe("GET /api/v1/compare: the seeded Orchard End variants", () => {
  it("each side's metrics equal what npm run calc gives for its document", async () => {
    const out = await compare("designer", `schematic:${bypassId}`, `schematic:${bufferId}`);
    expect(out.status, JSON.stringify(out.body)).toBe(200);
    const [docA, docB] = [await draftOf(bypassId), await draftOf(bufferId)];
    expect(out.body.a.metrics).toEqual(expectedFromCli(calcCli(docA), docA));
    expect(out.body.b.metrics).toEqual(expectedFromCli(calcCli(docB), docB));
    expect(out.body.a).toMatchObject({ ref: `schematic:${bypassId}`, name: "Bypass only — working draft" });
    // what the trainee compares them for: the buffer variant needs no buffer, bypass only does (engine: 95.8 L < 100 L minimum)
    expect([out.body.a.metrics.bufferRecommended, out.body.b.metrics.bufferRecommended]).toEqual([true, false]);
  }, 60_000);

  it("lists the buffer variant's extra parts as added, the bypass it drops as removed", async () => {
    const out = await compare("trainee", `schematic:${bypassId}`, `schematic:${bufferId}`);
    expect(out.status).toBe(200);
    const [a, b] = [await draftOf(bypassId), await draftOf(bufferId)];
    const ids = (d: any) => new Set<string>([...d.parts, ...d.pipes].map((x: any) => x.id));
    const only = (x: Set<string>, y: Set<string>) => [...x].filter((id) => !y.has(id)).sort();
    expect([...out.body.changes.added].sort()).toEqual(only(ids(b), ids(a)));
    expect([...out.body.changes.removed].sort()).toEqual(only(ids(a), ids(b)));
    // the seed's buffer vessel, its secondary pump and air vent are among them; the dp bypass valve is gone
    expect(out.body.changes.added).toEqual(expect.arrayContaining(["buf", "ps", "av2"]));
    expect(out.body.changes.removed).toContain("bp");
  });

  it("rows for the scenarios both share, with the engine's heat-source flow and the heat delivered", async () => {
    const out = await compare("reviewer", `schematic:${bypassId}`, `schematic:${bufferId}`);
    const cli = calcCli(await draftOf(bufferId));
    expect(out.body.scenarios.map((s: any) => s.name)).toEqual(["all zones open", "hot water", "all zones shut", "only zv1 open", "only zv2 open"]);
    const shut = out.body.scenarios.find((s: any) => s.name === "all zones shut");
    const cliShut = cli.scenarios.find((s: any) => s.name === "all zones shut");
    expect(shut.b.heatSourceFlowM3h).toBe(cliShut.heatSourceFlowM3h);
    expect(shut.b.heatDeliveredW).toBe(cliShut.emitters.reduce((s: number, e: any) => s + e.outputW, 0));
  }, 60_000);

  it("a revision against a draft; a design against itself shows no changes and the same numbers", async () => {
    const rev = await db()("schematic_revisions").where({ schematic_id: bypassId, number: 1 }).first("id");
    const out = await compare("reviewer", `revision:${rev.id}`, `revision:${rev.id}`);
    expect(out.status).toBe(200);
    expect(out.body.changes).toMatchObject({ added: [], removed: [], changed: [] });
    expect(out.body.a.metrics).toEqual(out.body.b.metrics);
    expect(out.body.a.name).toBe("Bypass only — Rev 1 (in-review)");
  });
});

describe("results kept with drafts and revisions are the ones compared", () => {
  const seed = () => {
    const p = parseSchematic(JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8")));
    if (!p.ok) throw new Error("seed");
    return p.doc;
  };
  const make = async (doc: Schematic) => {
    const r = await createSchematic({ projectId: ORCHARD_END, name: `${TAG} ${randomUUID().slice(0, 6)}`, doc, userId: "demo-designer", kind: "team" });
    if (!r.ok) throw new Error(r.reason);
    return r.schematic.id;
  };

  it("a draft's kept sizing is used while it was made for this document, and not once the draft changed", async () => {
    const doc = seed();
    const id = await make(doc);
    const real = calculate(doc);
    if (!real.ok) throw new Error("refused");
    // a kept answer marked so it can be told from a fresh one (what the store says is what compare shows)
    const marked = { ...real.results, volume: { ...real.results.volume, systemL: 123.25 } };
    await putDraftResults({ schematicId: id, engineVersion: ENGINE_VERSION, documentJson: JSON.stringify(doc), resultsJson: JSON.stringify(marked), userId: "demo-designer" });
    const kept = await compare("designer", `schematic:${id}`, `schematic:${id}`);
    expect(kept.body.a.metrics.systemVolumeL).toBe(123.25);
    // moving a part changes nothing sizing sees: still the kept answer
    const moved = { ...doc, parts: doc.parts.map((p, i) => (i === 0 ? { ...p, x: p.x + 40 } : p)) };
    await db()("schematics").where({ id }).update({ draft: JSON.stringify(moved) });
    expect((await compare("designer", `schematic:${id}`, `schematic:${id}`)).body.a.metrics.systemVolumeL).toBe(123.25);
    // a longer pipe does: sized again, the engine's own volume
    const longer = { ...doc, pipes: doc.pipes.map((p, i) => (i === 0 ? { ...p, lengthM: p.lengthM + 10 } : p)) };
    await db()("schematics").where({ id }).update({ draft: JSON.stringify(longer) });
    const fresh = calculate(longer);
    if (!fresh.ok) throw new Error("refused");
    expect((await compare("designer", `schematic:${id}`, `schematic:${id}`)).body.a.metrics.systemVolumeL).toBe(fresh.results.volume.systemL);
  });

  it("a revision's stored results for this engine are the ones shown", async () => {
    const doc = seed();
    const id = await make(doc);
    const [rev] = await db()("schematic_revisions").insert({ schematic_id: id, number: 1, document: JSON.stringify(doc), status: "draft", author_id: "demo-designer" }).returning("id");
    const real = calculate(doc);
    if (!real.ok) throw new Error("refused");
    const marked = { ...real.results, volume: { ...real.results.volume, minimumL: 77.5 } };
    await db()("revision_results").insert({ revision_id: rev.id, engine_version: ENGINE_VERSION, results: JSON.stringify(marked) });
    const out = await compare("designer", `revision:${rev.id}`, `schematic:${id}`);
    expect(out.body.a.metrics.minimumVolumeL).toBe(77.5);
    expect(out.body.b.metrics.minimumVolumeL).toBe(real.results.volume.minimumL);
  });
});

describe("practice variants stay private", () => {
  let practiceRef = "";
  let otherTrainee = "";
  beforeAll(async () => {
    const made = await post("trainee", ORCHARD_END, { name: `${TAG} Nia's buffer try`, kind: "practice", from: `schematic:${bufferId}` });
    expect(made.status, JSON.stringify(made.body)).toBe(201);
    practiceRef = `schematic:${made.body.schematic.id}`;
    otherTrainee = `${TAG}-trainee2`;
    await db()("users").insert({ id: otherTrainee, email: `${otherTrainee}@example.test`, name: "Second Trainee", password_hash: "x" });
    await db()("project_members").insert({ project_id: ORCHARD_END, user_id: otherTrainee, role: "trainee" });
    cookies.set("trainee2", await cookieForUser(otherTrainee));
  });

  it("its maker, the project's reviewers and owners compare it; an installer and another trainee get 404", async () => {
    for (const who of ["trainee", "reviewer", "owner"]) expect((await compare(who, practiceRef, `schematic:${bypassId}`)).status, who).toBe(200);
    for (const who of ["installer", "trainee2", "designer"]) {
      const out = await compare(who, `schematic:${bypassId}`, practiceRef);
      expect(out.status, who).toBe(404);
      // the same words as for a design that does not exist: no hint that it does
      const missing = await compare(who, `schematic:${bypassId}`, `schematic:${randomUUID()}`);
      expect(out.body.error.replace(/schematic:[0-9a-f-]+/g, "REF")).toBe(missing.body.error.replace(/schematic:[0-9a-f-]+/g, "REF"));
    }
  });

  it("the board's read route follows the same rule", async () => {
    const id = practiceRef.split(":")[1]!;
    const get = async (who: string) => callRoute((await import("@/app/api/v1/schematics/[schematicId]/route")).GET as never,
      { path: `/api/v1/schematics/${id}`, cookie: cookies.get(who)!, params: { schematicId: id } });
    expect((await get("reviewer")).status).toBe(200);
    expect((await get("trainee2")).status).toBe(404);
    expect((await get("installer")).status).toBe(404);
  });
});

describe("bad refs", () => {
  it("a ref that does not parse is 400 naming the field; a missing one too", async () => {
    const bad = await compare("designer", "schematic:not-an-id", `schematic:${bypassId}`);
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("a");
    expect(bad.body.error).toMatch(/schematic:\{id\}/);
    const kind = await compare("designer", `schematic:${bypassId}`, `project:${ORCHARD_END}`);
    expect([kind.status, kind.body.issues[0].path]).toEqual([400, "b"]);
    const missing = await compare("designer", `schematic:${bypassId}`);
    expect([missing.status, missing.body.issues[0].path]).toEqual([400, "b"]);
  });

  it("a revision that does not exist is 404; signed out is 401", async () => {
    expect((await compare("designer", `revision:${randomUUID()}`, `schematic:${bypassId}`)).status).toBe(404);
    expect((await compare("nobody", `schematic:${bypassId}`, `schematic:${bypassId}`)).status).toBe(401);
  });
});

describe("POST /api/v1/projects/{id}/schematics", () => {
  it("copies a revision as a team variant: 201 {schematic}, its document, variant of its schematic", async () => {
    const rev = await db()("schematic_revisions").where({ schematic_id: bypassId, number: 1 }).first("id", "document");
    const out = await post("designer", ORCHARD_END, { name: `${TAG} from rev 1`, kind: "team", from: `revision:${rev.id}` });
    expect(out.status, JSON.stringify(out.body)).toBe(201);
    expect(out.body.schematic).toMatchObject({ name: `${TAG} from rev 1`, kind: "team", projectId: ORCHARD_END, variantOf: bypassId, ownerId: "demo-designer" });
    expect(out.body.schematic.draft).toBeUndefined();
    const draft = await draftOf(out.body.schematic.id);
    expect({ ...draft, name: null }).toEqual({ ...(parseSchematic(rev.document) as { doc: object }).doc, name: null });
    expect(draft.name).toBe(`${TAG} from rev 1`);
  });

  it("an empty one starts from the project's design conditions", async () => {
    const out = await post("owner", ORCHARD_END, { name: `${TAG} empty`, kind: "team" });
    expect(out.status).toBe(201);
    const draft = await draftOf(out.body.schematic.id);
    expect([draft.parts, draft.design.minOutdoorTemperatureC]).toEqual([[], -2]); // the seeded project's outdoor temperature
  });

  it("a trainee makes practice variants only; reviewers and installers none", async () => {
    const team = await post("trainee", ORCHARD_END, { name: `${TAG} t`, kind: "team" });
    expect(team.status).toBe(403);
    expect(team.body.error).toMatch(/practice/);
    expect((await post("reviewer", ORCHARD_END, { name: `${TAG} r`, kind: "practice" })).status).toBe(403);
    expect((await post("installer", ORCHARD_END, { name: `${TAG} i`, kind: "team" })).status).toBe(403);
    const mine = await post("trainee", ORCHARD_END, { name: `${TAG} p`, kind: "practice" });
    expect([mine.status, mine.body.schematic.kind, mine.body.schematic.ownerId]).toEqual([201, "practice", "demo-trainee"]);
  });

  it("bad input names the field and saves nothing", async () => {
    const before = await db()("schematics").where({ project_id: ORCHARD_END }).count("* as n").first();
    const cases: [unknown, string][] = [
      [{ kind: "team" }, "name"],
      [{ name: " ", kind: "team" }, "name"],
      [{ name: `${TAG} x`, kind: "private" }, "kind"],
      [{ name: `${TAG} x`, kind: "team", from: "draft:1" }, "from"],
    ];
    for (const [body, field] of cases) {
      const out = await post("designer", ORCHARD_END, body);
      expect(out.status, JSON.stringify(body)).toBe(400);
      expect(out.body.issues.map((i: any) => i.path)).toContain(field);
    }
    const millbrook = await db()("schematics").where({ project_id: "6a0f3c1e-0000-4000-8000-000000000101" }).first("id");
    const other = await post("designer", ORCHARD_END, { name: `${TAG} x`, kind: "team", from: `schematic:${millbrook.id}` });
    expect([other.status, other.body.issues[0].path]).toEqual([400, "from"]);
    expect((await post("designer", ORCHARD_END, { name: `${TAG} x`, kind: "team", from: `schematic:${randomUUID()}` })).status).toBe(404);
    expect((await post("designer", ORCHARD_END, { name: "Bypass only", kind: "team" })).status).toBe(409);
    expect(await db()("schematics").where({ project_id: ORCHARD_END }).count("* as n").first()).toEqual(before);
  });
});
