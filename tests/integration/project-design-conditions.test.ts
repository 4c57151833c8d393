import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { callAction, callRoute, cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture } from "./helpers/fixture";

// A project's design conditions: what its new schematics start with. Bad conditions are
// refused with the field named and nothing saved; a new schematic takes the saved ones.

const route = () => import("@/app/api/v1/projects/[projectId]/design-conditions/route");
const projectActions = () => import("@/components/projects/actions");

afterAll(async () => {
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

const put = async (projectId: string, body: unknown) =>
  callRoute((await route()).PUT as never, { method: "PUT", path: `/api/v1/projects/${projectId}/design-conditions`, cookie: await cookieFor("designer"), params: { projectId }, body });
const stored = async (projectId: string) => (await db()("projects").where({ id: projectId }).first("design_conditions")).design_conditions;

describe("project design conditions", () => {
  it("a new schematic starts with the project's fluid and design conditions", async () => {
    const f = await makeFixture();
    const saved = await put(f.projectId, { fluid: { kind: "propylene-glycol", percentByVolume: 30 }, design: { flowTemperatureC: 50, returnTemperatureC: 43, minOutdoorTemperatureC: -7 } });
    expect(saved.status).toBe(200);
    const created = await callAction(async () => (await projectActions()).createSchematicAction({ projectId: f.projectId, name: "From defaults" }), await cookieFor("designer"));
    expect(created.status).toBe(200);
    const row = await db()("schematics").where({ id: (created.body as { data: { id: string } }).data.id }).first("draft");
    expect(row.draft.fluid).toEqual({ kind: "propylene-glycol", percentByVolume: 30 });
    expect(row.draft.design).toMatchObject({ flowTemperatureC: 50, returnTemperatureC: 43, minOutdoorTemperatureC: -7, safetyValveBar: 3 });
    const read = await callRoute((await route()).GET as never, { path: "x", cookie: await cookieFor("reviewer"), params: { projectId: f.projectId } });
    expect(read.body).toMatchObject({ design: { flowTemperatureC: 50 } });
  });

  it.each([
    ["a return above the flow", { design: { flowTemperatureC: 40, returnTemperatureC: 45 } }, "design.returnTemperatureC"],
    ["a glycol share outside the tables", { fluid: { kind: "ethylene-glycol", percentByVolume: 55 }, design: {} }, "fluid.percentByVolume"],
    ["a static height the safety valve cannot take", { design: { staticHeightM: 30, safetyValveBar: 3 } }, "design.staticHeightM"],
  ])("refuses %s, naming the field, and saves nothing", async (_what, body, path) => {
    const f = await makeFixture();
    const before = await stored(f.projectId);
    const r = await put(f.projectId, body);
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.body)).toContain(path);
    expect(await stored(f.projectId)).toEqual(before);
  });
});
