import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import * as projectActions from "@/components/projects/actions";
import * as projectItem from "@/app/api/v1/projects/[projectId]/route";
import * as projectList from "@/app/api/v1/projects/route";
import { parseSchematic } from "@/lib/schematic";
import { signUpAndConfirm } from "./helpers/accounts";
import { callAction, callRoute, cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture } from "./helpers/fixture";

// Projects on screen: a new firm's first project (with design defaults), a copy of the demo
// project, renaming and archiving. Real PostgreSQL; the sign-up makes a firm of its own.

const firmName = `Test firm projects ${randomUUID().slice(0, 6)}`;
const email = `projects-${randomUUID().slice(0, 8)}@example.test`;

afterAll(async () => {
  await dropFixtures();
  await db()("projects").whereIn("organisation_id", db()("organisations").where({ name: firmName }).select("id")).delete();
  await db()("users").where({ email }).delete();
  await db()("organisations").where({ name: firmName }).delete();
  await db().destroy();
  await pgPool().end();
});

/** A person who just signed up with a firm of their own: it has no projects. */
let cookie = "";
beforeAll(async () => {
  cookie = await signUpAndConfirm({ name: "Wren Marsh", email, password: "heron-lane-copper-27", firm: firmName });
});

describe("a new firm's first projects", () => {
  it("starts empty, creates a project with client, site and design defaults, and its schematics start from them", async () => {
    const list = await callRoute(projectList.GET as never, { path: "/api/v1/projects", cookie });
    expect(list.body.projects).toEqual([]);
    const made = await callAction(() => projectActions.createProjectAction({ name: "Heron Cottage", client: "The Heron household", site: "Invented lane",
      design: { flowTemperatureC: 50, returnTemperatureC: 43, outdoorC: -5, heatSource: "9 kW heat pump" } }), cookie);
    expect(made.status).toBe(200);
    const id = made.body.data.id as string;
    const row = await db()("projects").where({ id }).first();
    expect(row).toMatchObject({ name: "Heron Cottage", client: "The Heron household", site: "Invented lane" });
    // stored in the one shape of the project's design conditions (lib/schematic/project-defaults.ts)
    expect(row.design_conditions).toMatchObject({ fluid: { kind: "water" }, heatSource: "9 kW heat pump",
      design: { flowTemperatureC: 50, returnTemperatureC: 43, minOutdoorTemperatureC: -5 } });
    const s = await callAction(() => projectActions.createSchematicAction({ projectId: id, name: "Plant room" }), cookie);
    expect(s.status).toBe(200);
    const draft = parseSchematic((await db()("schematics").where({ id: s.body.data.id }).first()).draft);
    expect(draft.ok && draft.doc.design).toMatchObject({ flowTemperatureC: 50, returnTemperatureC: 43, minOutdoorTemperatureC: -5 });
  });
  it("refuses a bad design default with a message naming the field, and creates nothing", async () => {
    const before = await db()("projects").count("* as n").first();
    const bad = await callAction(() => projectActions.createProjectAction({ name: `Bad ${randomUUID()}`, design: { flowTemperatureC: 40, returnTemperatureC: 45 } }), await cookieFor("designer"));
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/design\.returnTemperatureC: Return temperature must be below the flow temperature/);
    expect(await db()("projects").count("* as n").first()).toEqual(before);
  });
  it("copies the demo project into the caller's firm: both demo schematics as drafts, the caller its owner", async () => {
    const out = await callAction(() => projectActions.copyDemoProjectAction(), cookie);
    expect(out.status).toBe(200);
    const p = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id").where("p.id", out.body.data.id).first("p.name", "o.name as firm");
    expect(p).toEqual({ name: "Orchard End (demo copy)", firm: firmName });
    const schematics = await db()("schematics").where({ project_id: out.body.data.id }).orderBy("name").pluck("name");
    expect(schematics).toEqual(["Bypass only", "With 40 L buffer"]);
    expect(await db()("schematic_revisions").whereIn("schematic_id", db()("schematics").where({ project_id: out.body.data.id }).select("id")).count("* as n").first()).toMatchObject({ n: "0" });
    const again = await callAction(() => projectActions.copyDemoProjectAction(), cookie);
    expect((await db()("projects").where({ id: again.body.data.id }).first()).name).toBe("Orchard End (demo copy 2)");
  });
});

describe("rename and archive", () => {
  const patch = async (who: "owner" | "designer" | "reviewer", projectId: string, body: unknown) =>
    callRoute(projectItem.PATCH as never, { method: "PATCH", path: `/api/v1/projects/${projectId}`, cookie: await cookieFor(who), params: { projectId }, body });
  it("owner and designer rename and archive; the list says archived; a reviewer may not", async () => {
    const f = await makeFixture();
    const renamed = await patch("designer", f.projectId, { name: `${f.projectName} renamed`, site: "New site" });
    expect(renamed.status).toBe(200);
    expect(renamed.body.project).toMatchObject({ name: `${f.projectName} renamed`, site: "New site", archivedAt: null });
    const archived = await patch("owner", f.projectId, { archived: true });
    expect(archived.body.project.archivedAt).not.toBeNull();
    const list = await callRoute(projectList.GET as never, { path: "/api/v1/projects", cookie: await cookieFor("reviewer") });
    expect(list.body.projects.find((p: { id: string }) => p.id === f.projectId)).toMatchObject({ archivedAt: expect.any(String) });
    const denied = await patch("reviewer", f.projectId, { archived: false });
    expect(denied.status).toBe(403);
    expect((await db()("projects").where({ id: f.projectId }).first()).archived_at).not.toBeNull();
    expect((await patch("owner", f.projectId, { archived: false })).body.project.archivedAt).toBeNull();
    expect((await db()("audit_log").where({ project_id: f.projectId }).pluck("action")).sort()).toEqual(["project.archived", "project.restored", "project.updated"]);
  });
  it("refuses an empty change, a taken name and a bad field with clear 4xx answers", async () => {
    const f = await makeFixture();
    expect((await patch("owner", f.projectId, {})).status).toBe(400);
    const taken = await patch("owner", f.projectId, { name: "Orchard End" });
    expect(taken.status).toBe(409);
    expect(taken.body.error).toMatch(/already has a project called "Orchard End"/);
    const bad = await patch("owner", f.projectId, { archived: "yes" });
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/archived/);
  });
});
