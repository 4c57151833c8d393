import { randomUUID } from "node:crypto";
import { db } from "@/lib/db";
import { readFileSync } from "node:fs";
import path from "node:path";
import { callAction, callRoute, cookieFor, form, type Outcome, type Who } from "./helpers/call";
import { FIXTURE_PREFIX, type Fixture } from "./helpers/fixture";
import { fixturePhoto } from "./helpers/photo";

// The registry of every API route and server action, for the role matrix
// (role-matrix.test.ts). One row per route/action: how to call it against a fresh fixture
// project, and the status each caller must get. Board engineers: add your routes here,
// one row each (see the TODO rows at the bottom).
//
//   expect: allow(["owner", "designer"])        → those 2xx, other members 403, signed out 401
//   expect: allow(["owner"], 204)               → a specific success status
//   expect: { ...allow([...]), installer: 404 } → override single cells
//
// A denial (401/403/404) must carry {error: "<message>"} and leave the fixture untouched.
// Modules are imported inside `call`, so a broken route fails its own row only.

export type Expect = Record<Who, number>;
export type Row = {
  name: string;
  kind: "route" | "action";
  /** Fixture options, e.g. an issued revision for installer rows. */
  fixture?: { revisionStatus?: "draft" | "in-review" | "approved" | "issued"; rooms?: boolean };
  /** Set-up a row needs beyond the fixture (made before the "nothing changed" snapshot); its result is passed to call. */
  prepare?: (f: Fixture) => Promise<string>;
  call?: (f: Fixture, cookie: string | null, who: Who, prepared?: string) => Promise<Outcome>;
  expect?: Expect;
  /** A route that does not exist yet: shown as a todo in the test report. */
  todo?: string;
};

const members: Who[] = ["owner", "designer", "reviewer", "installer", "trainee"];
const same = (status: number): Expect => ({ owner: status, designer: status, reviewer: status, installer: status, trainee: status, anon: status });
const randomIp = () => `10.8.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

export function allow(who: Who[], ok = 200): Expect {
  const e = {} as Expect;
  for (const w of [...members, "anon" as Who]) e[w] = who.includes(w) ? ok : w === "anon" ? 401 : 403;
  return e;
}

const sessionRoute = () => import("@/app/api/v1/session/route");
const projectRoute = () => import("@/app/api/v1/projects/route");
const projectItemRoute = () => import("@/app/api/v1/projects/[projectId]/route");
const schematicRoute = () => import("@/app/api/v1/schematics/[schematicId]/route");
const calculateRoute = () => import("@/app/api/v1/calculate/route");
const revisionRoute = () => import("@/app/api/v1/revisions/[revisionId]/route");
const roomsRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/route");
const roomsImportRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/import/route");
const flowRoute = () => import("@/app/api/v1/projects/[projectId]/rooms/flow-temperature/route");
const draftsRoute = () => import("@/app/api/v1/projects/[projectId]/drafts/route");
const emitterListRoute = () => import("@/app/api/v1/projects/[projectId]/emitter-list/route");
const demoFile = (f: string) => readFileSync(path.join(process.cwd(), "db/seeds/data", f), "utf8");
const oneRoom = { name: "Matrix room", roomTemperatureC: 20, heatLossW: 800, emitter: { kind: "radiator", outputAtDt50W: 2400, exponentN: 1.3 } };
const optimiseRoute = () => import("@/app/api/v1/optimise/route");
const reportPdfRoute = () => import("@/app/api/v1/revisions/[revisionId]/report.pdf/route");
const reportHtmlRoute = () => import("@/app/api/v1/revisions/[revisionId]/report/route");
const materialsJsonRoute = () => import("@/app/api/v1/revisions/[revisionId]/materials.json/route");
const materialsCsvRoute = () => import("@/app/api/v1/revisions/[revisionId]/materials.csv/route");
const priceListRoute = () => import("@/app/api/v1/projects/[projectId]/price-list/route");
const handoverRoute = () => import("@/app/api/v1/revisions/[revisionId]/handover/route");
const teamActions = () => import("@/components/team/actions");
const authActions = () => import("@/components/auth/actions");
const projectActions = () => import("@/components/projects/actions");
const boardActions = () => import("@/components/drawing-board/actions");
const unitActions = () => import("@/components/units/actions");
const designRoute = () => import("@/app/api/v1/projects/[projectId]/design-conditions/route");
const designActions = () => import("@/components/design-conditions/actions");
const projectDefaults = { fluid: { kind: "water" }, design: { flowTemperatureC: 50, returnTemperatureC: 43 } };
const reviewActions = () => import("@/components/review/actions");
const projectSchematicsRoute = () => import("@/app/api/v1/projects/[projectId]/schematics/route");
const threadsRoute = () => import("@/app/api/v1/schematics/[schematicId]/threads/route");
const historyRoute = () => import("@/app/api/v1/schematics/[schematicId]/revisions/route");
const eventsRoute = () => import("@/app/api/v1/schematics/[schematicId]/events/route");
const threadRoute = () => import("@/app/api/v1/threads/[threadId]/route");
const repliesRoute = () => import("@/app/api/v1/threads/[threadId]/replies/route");
const messageRoute = () => import("@/app/api/v1/messages/[messageId]/route");
const statusRoute = () => import("@/app/api/v1/revisions/[revisionId]/status/route");
const restoreRoute = () => import("@/app/api/v1/revisions/[revisionId]/restore/route");

/** The live stream answers 200 and stays open: read its status and the first bytes, then hang up. */
async function openStream(schematicId: string, cookie: string | null): Promise<Outcome> {
  const { GET } = await eventsRoute();
  const headers = new Headers(cookie ? { cookie } : {});
  const res = await (GET as never as (r: Request, c: unknown) => Promise<Response>)(
    new Request(`http://test.local/api/v1/schematics/${schematicId}/events`, { headers }), { params: Promise.resolve({ schematicId }) });
  if (res.status !== 200) return { status: res.status, body: await res.json(), setCookies: [] };
  const reader = res.body!.getReader();
  const first = new TextDecoder().decode((await reader.read()).value);
  await reader.cancel();
  return { status: first.startsWith("retry:") && /event-stream/.test(res.headers.get("content-type") ?? "") ? 200 : 500, body: null, setCookies: [] };
}
const siteRoute = () => import("@/app/api/v1/schematics/[schematicId]/site/route");
const siteEventsRoute = () => import("@/app/api/v1/schematics/[schematicId]/site/events/route");
const uploadsRoute = () => import("@/app/api/v1/projects/[projectId]/uploads/route");
const attachmentsRoute = () => import("@/app/api/v1/projects/[projectId]/attachments/route");
const completeRoute = () => import("@/app/api/v1/uploads/[uploadId]/complete/route");
const thumbnailRoute = () => import("@/app/api/v1/uploads/[uploadId]/thumbnail/route");
const fileRoute = () => import("@/app/api/v1/uploads/[uploadId]/file/route");
const siteActions = () => import("@/components/site-sheet/actions");
const siteTick = () => ({ events: [{ id: randomUUID(), kind: "tick", target: "pri-f1", data: {}, madeAt: new Date().toISOString() }] });
const compareRoute = () => import("@/app/api/v1/compare/route");
// practice variants: their maker, and the project's owners and reviewers; to anyone else 404, as if absent
const practiceReaders = (e: Expect): Expect => ({ ...e, designer: 404, installer: 404 });
const compare = async (cookie: string | null, a: string, b: string) =>
  callRoute((await compareRoute()).GET as never, { path: `/api/v1/compare?a=${encodeURIComponent(a)}&b=${encodeURIComponent(b)}`, cookie });
const newSchematic = async (f: Fixture, cookie: string | null, body: Record<string, unknown>) => callRoute((await projectSchematicsRoute()).POST as never, {
  method: "POST", path: `/api/v1/projects/${f.projectId}/schematics`, cookie, params: { projectId: f.projectId }, body: { name: `New ${randomUUID().slice(0, 6)}`, ...body },
});

export const rows: Row[] = [
  // ——— session ———
  {
    name: "GET /api/v1/session", kind: "route", expect: allow(members),
    call: async (_f, cookie) => callRoute((await sessionRoute()).GET as never, { path: "/api/v1/session", cookie }),
  },
  {
    // signing out is open to anyone (a no-op when signed out); the matrix checks it never fails
    name: "DELETE /api/v1/session", kind: "route", expect: { owner: 204, designer: 204, reviewer: 204, installer: 204, trainee: 204, anon: 204 },
    // a session of its own, so the shared per-role cookie survives for the other rows
    call: async (_f, _cookie, who) => callRoute((await sessionRoute()).DELETE as never, { method: "DELETE", path: "/api/v1/session", cookie: await cookieFor(who) }),
  },

  // ——— projects ———
  {
    name: "GET /api/v1/projects", kind: "route", expect: allow(members),
    call: async (_f, cookie) => callRoute((await projectRoute()).GET as never, { path: "/api/v1/projects", cookie }),
  },
  {
    // firm owners and designers only (issue 17): the demo owner owns the firm, the designer designs on its projects
    name: "POST /api/v1/projects", kind: "route", expect: allow(["owner", "designer"], 201),
    call: async (_f, cookie) => callRoute((await projectRoute()).POST as never, {
      method: "POST", path: "/api/v1/projects", cookie, body: { name: `${FIXTURE_PREFIX} new ${randomUUID().slice(0, 8)}`, client: "Test" },
    }),
  },
  {
    name: "GET /api/v1/projects/[projectId]", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await projectItemRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "DELETE /api/v1/projects/[projectId]", kind: "route", expect: allow(["owner"], 204),
    call: async (f, cookie) => callRoute((await projectItemRoute()).DELETE as never, { method: "DELETE", path: `/api/v1/projects/${f.projectId}`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "GET /api/v1/projects/[projectId]/design-conditions", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await designRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/design-conditions`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "PUT /api/v1/projects/[projectId]/design-conditions", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await designRoute()).PUT as never, {
      method: "PUT", path: `/api/v1/projects/${f.projectId}/design-conditions`, cookie, params: { projectId: f.projectId }, body: projectDefaults,
    }),
  },
  {
    name: "action saveProjectDefaultsAction", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await designActions()).saveProjectDefaultsAction({ projectId: f.projectId, defaults: projectDefaults }), cookie),
  },

  {
    name: "PATCH /api/v1/projects/[projectId] (rename)", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await projectItemRoute()).PATCH as never, {
      method: "PATCH", path: `/api/v1/projects/${f.projectId}`, cookie, params: { projectId: f.projectId }, body: { name: `${f.projectName} renamed` },
    }),
  },
  {
    name: "action updateProjectAction (archive)", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await projectActions()).updateProjectAction({ projectId: f.projectId, change: { archived: true } }), cookie),
  },
  {
    // firm owners and designers only, as POST /api/v1/projects
    name: "action createProjectAction", kind: "action", expect: { ...allow(["owner", "designer"]), anon: 401 },
    call: async (_f, cookie) => callAction(async () => (await projectActions()).createProjectAction({ name: `${FIXTURE_PREFIX} new ${randomUUID().slice(0, 8)}` }), cookie),
  },
  {
    // a copy lands in the caller's firm (Fernbank for the demo people); removed again so rows do not pile up
    name: "action copyDemoProjectAction", kind: "action", expect: allow(["owner", "designer"]),
    call: async (_f, cookie) => {
      const out = await callAction(async () => (await projectActions()).copyDemoProjectAction(), cookie);
      if (out.status === 200) await db()("projects").where({ id: out.body.data.id }).delete();
      return out;
    },
  },

  // ——— team (server actions) ———
  {
    name: "action inviteAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await teamActions()).inviteAction(null, form({ projectId: f.projectId, email: `new-${randomUUID().slice(0, 8)}@example.test`, role: "reviewer" })), cookie),
  },
  {
    name: "action revokeInvitationAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await teamActions()).revokeInvitationAction(null, form({ projectId: f.projectId, invitationId: f.invitationId })), cookie),
  },
  {
    name: "action changeRoleAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await teamActions()).changeRoleAction(null, form({ projectId: f.projectId, userId: "demo-installer", role: "reviewer" })), cookie),
  },
  {
    name: "action removeMemberAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await teamActions()).removeMemberAction(null, form({ projectId: f.projectId, userId: "demo-reviewer" })), cookie),
  },

  // ——— account (server actions that need only a signed-in person) ———
  {
    // a wrong current password: signed-in callers get the 400 "not right" answer, nothing changes
    name: "action changePasswordAction (wrong current password)", kind: "action",
    expect: { owner: 400, designer: 400, reviewer: 400, installer: 400, trainee: 400, anon: 401 },
    call: async (_f, cookie) => callAction(async () => (await authActions()).changePasswordAction(null, form({ current: "not-the-password", password: "a-new-password-1" })), cookie),
  },
  {
    name: "action acceptInvitationAction (someone else's invitation)", kind: "action",
    // an invitation is accepted only by the account it was sent to (issue 17 item 4); signed out → 401
    expect: { owner: 403, designer: 403, reviewer: 403, installer: 403, trainee: 403, anon: 401 },
    call: async (f, cookie) => {
      const out = await callAction(async () => (await authActions()).acceptInvitationAction(null, form({ token: f.invitationToken })), cookie);
      return out.status === 303 ? { ...out, status: 200 } : out;
    },
  },

  // ——— schematics (board routes) ———
  {
    // sizing needs a role that may size on some project (issue 17): owner, designer, trainee
    name: "POST /api/v1/calculate", kind: "route", expect: allow(["owner", "designer", "trainee"]),
    call: async (f, cookie) => callRoute((await calculateRoute()).POST as never, { method: "POST", path: "/api/v1/calculate", cookie, body: f.doc }),
  },
  {
    // like calculate: a role that may size on some project may optimise a document it sends (nothing is stored)
    name: "POST /api/v1/optimise", kind: "route", expect: allow(["owner", "designer", "trainee"]),
    call: async (f, cookie) => callRoute((await optimiseRoute()).POST as never, { method: "POST", path: "/api/v1/optimise", cookie, body: { doc: f.doc, options: {} } }),
  },
  {
    name: "GET /api/v1/schematics/[id] team, draft only", kind: "route",
    expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await schematicRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "GET /api/v1/schematics/[id] team, issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await schematicRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "GET /api/v1/schematics/[id] practice variant", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"])),
    call: async (f, cookie) => callRoute((await schematicRoute()).GET as never, { path: `/api/v1/schematics/${f.practiceSchematicId}`, cookie, params: { schematicId: f.practiceSchematicId } }),
  },
  {
    name: "PUT /api/v1/schematics/[id] team draft", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await schematicRoute()).PUT as never, {
      method: "PUT", path: `/api/v1/schematics/${f.teamSchematicId}`, cookie, params: { schematicId: f.teamSchematicId }, body: { lockVersion: f.lockVersion, doc: f.doc },
    }),
  },
  {
    name: "PUT /api/v1/schematics/[id] practice variant", kind: "route", expect: practiceReaders(allow(["trainee"])),
    call: async (f, cookie) => callRoute((await schematicRoute()).PUT as never, {
      method: "PUT", path: `/api/v1/schematics/${f.practiceSchematicId}`, cookie, params: { schematicId: f.practiceSchematicId }, body: { lockVersion: f.lockVersion, doc: f.doc },
    }),
  },

  {
    name: "GET /api/v1/revisions/[id] draft revision", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await revisionRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/revisions/[id] issued revision", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await revisionRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}`, cookie, params: { revisionId: f.revisionId } }),
  },

  // ——— side by side (issue 10): compare needs the right to read both designs and the role to compare ———
  {
    // installers read issued revisions only: a draft is not theirs to read (404, like a missing one)
    name: "GET /api/v1/compare draft vs its revision", kind: "route", expect: { ...allow(["owner", "designer", "reviewer", "trainee"]), installer: 404 },
    call: async (f, cookie) => compare(cookie, `schematic:${f.teamSchematicId}`, `revision:${f.revisionId}`),
  },
  {
    // an installer can read an issued revision but may not compare (policy variant.compare)
    name: "GET /api/v1/compare issued revision with itself", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(["owner", "designer", "reviewer", "trainee"]),
    call: async (f, cookie) => compare(cookie, `revision:${f.revisionId}`, `revision:${f.revisionId}`),
  },
  {
    name: "GET /api/v1/compare practice variant vs team draft", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"])),
    call: async (f, cookie) => compare(cookie, `schematic:${f.practiceSchematicId}`, `schematic:${f.teamSchematicId}`),
  },
  {
    name: "POST /api/v1/projects/[projectId]/schematics team, from the draft", kind: "route", expect: allow(["owner", "designer"], 201),
    call: async (f, cookie) => newSchematic(f, cookie, { kind: "team", from: `schematic:${f.teamSchematicId}` }),
  },
  {
    name: "POST /api/v1/projects/[projectId]/schematics practice, from the revision", kind: "route", expect: allow(["owner", "designer", "trainee"], 201),
    call: async (f, cookie) => newSchematic(f, cookie, { kind: "practice", from: `revision:${f.revisionId}` }),
  },
  {
    name: "POST /api/v1/projects/[projectId]/schematics practice, empty", kind: "route", expect: allow(["owner", "designer", "trainee"], 201),
    call: async (f, cookie) => newSchematic(f, cookie, { kind: "practice" }),
  },

  // ——— drawing board server actions (app/(app)/projects/[projectId]/…/actions.ts) ———
  {
    name: "action createSchematicAction", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await projectActions()).createSchematicAction({ projectId: f.projectId, name: `New ${randomUUID().slice(0, 6)}` }), cookie),
  },
  {
    // designers and owners get a team variant, trainees a private practice one
    name: "action newVariantAction (of the team schematic)", kind: "action", expect: allow(["owner", "designer", "trainee"]),
    call: async (f, cookie) => callAction(async () => (await projectActions()).newVariantAction({ schematicId: f.teamSchematicId }), cookie),
  },
  {
    name: "action autosaveDraft team schematic", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).autosaveDraft({ schematicId: f.teamSchematicId, lockVersion: f.lockVersion, doc: f.doc }), cookie),
  },
  {
    name: "action autosaveDraft practice variant", kind: "action", expect: practiceReaders(allow(["trainee"])),
    call: async (f, cookie) => callAction(async () => (await boardActions()).autosaveDraft({ schematicId: f.practiceSchematicId, lockVersion: f.lockVersion, doc: f.doc }), cookie),
  },
  {
    name: "action saveRevision team schematic", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).saveRevision({ schematicId: f.teamSchematicId, lockVersion: f.lockVersion, doc: f.doc, message: "matrix" }), cookie),
  },
  {
    name: "action setRevisionStatus draft → in-review (submit)", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).setRevisionStatus({ revisionId: f.revisionId, status: "in-review" }), cookie),
  },
  {
    name: "action setRevisionStatus in-review → approved (review)", kind: "action", fixture: { revisionStatus: "in-review" }, expect: allow(["owner", "reviewer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).setRevisionStatus({ revisionId: f.revisionId, status: "approved" }), cookie),
  },
  {
    name: "action setRevisionStatus in-review → draft (send back)", kind: "action", fixture: { revisionStatus: "in-review" }, expect: allow(["owner", "reviewer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).setRevisionStatus({ revisionId: f.revisionId, status: "draft", reason: "Matrix: send back" }), cookie),
  },
  {
    name: "action setRevisionStatus approved → issued (issue)", kind: "action", fixture: { revisionStatus: "approved" }, expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).setRevisionStatus({ revisionId: f.revisionId, status: "issued" }), cookie),
  },
  {
    name: "action startNewDraft after an issue", kind: "action", fixture: { revisionStatus: "issued" }, expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).startNewDraft({ schematicId: f.teamSchematicId }), cookie),
  },
  {
    name: "action sizeSchematic team schematic", kind: "action", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).sizeSchematic({ schematicId: f.teamSchematicId, doc: f.doc }), cookie),
  },
  {
    name: "action sizeSchematic practice variant", kind: "action", expect: practiceReaders(allow(["trainee"])),
    call: async (f, cookie) => callAction(async () => (await boardActions()).sizeSchematic({ schematicId: f.practiceSchematicId, doc: f.doc }), cookie),
  },

  {
    // a document not saved anywhere (the open calculator): the same roles as POST /api/v1/calculate
    name: "action sizeSchematic without a schematic id", kind: "action", expect: allow(["owner", "designer", "trainee"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).sizeSchematic({ doc: f.doc }), cookie),
  },

  {
    // the conflict dialog's "Save mine as a variant": team variant for designers/owners, practice for trainees
    name: "action saveAsVariant (of the team schematic)", kind: "action", expect: allow(["owner", "designer", "trainee"]),
    call: async (f, cookie) => callAction(async () => (await boardActions()).saveAsVariant({ schematicId: f.teamSchematicId, doc: f.doc, name: "Matrix variant" }), cookie),
  },
  {
    name: "action saveUnitPreference", kind: "action", expect: allow(members),
    call: async (_f, cookie) => callAction(async () => (await unitActions()).saveUnitPreference({ flow: "m3/h", pressure: "kPa" }), cookie),
  },

  // ——— rooms, flow temperature, first drafts (read: every member; change: owner, designer) ———
  {
    name: "GET /api/v1/projects/[projectId]/rooms", kind: "route", fixture: { rooms: true }, expect: allow(members),
    call: async (f, cookie) => callRoute((await roomsRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/rooms`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "PUT /api/v1/projects/[projectId]/rooms", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await roomsRoute()).PUT as never, { method: "PUT", path: `/api/v1/projects/${f.projectId}/rooms`, cookie, params: { projectId: f.projectId }, body: { rooms: [oneRoom] } }),
  },
  {
    name: "POST /api/v1/projects/[projectId]/rooms/import (preview)", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await roomsImportRoute()).POST as never, { method: "POST", path: `/api/v1/projects/${f.projectId}/rooms/import`, cookie, params: { projectId: f.projectId }, rawBody: demoFile("orchard-end-rooms.csv"), contentType: "text/csv" }),
  },
  {
    name: "POST /api/v1/projects/[projectId]/rooms/import?save=true", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await roomsImportRoute()).POST as never, { method: "POST", path: `/api/v1/projects/${f.projectId}/rooms/import?save=true`, cookie, params: { projectId: f.projectId }, rawBody: demoFile("orchard-end-rooms.csv"), contentType: "text/csv" }),
  },
  {
    name: "GET /api/v1/projects/[projectId]/rooms/flow-temperature", kind: "route", fixture: { rooms: true }, expect: allow(members),
    call: async (f, cookie) => callRoute((await flowRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/rooms/flow-temperature?flowC=45&deltaK=5`, cookie, params: { projectId: f.projectId } }),
  },
  {
    // designers and owners get a team schematic, trainees a private practice one
    name: "POST /api/v1/projects/[projectId]/drafts", kind: "route", fixture: { rooms: true }, expect: allow(["owner", "designer", "trainee"], 201),
    call: async (f, cookie) => callRoute((await draftsRoute()).POST as never, { method: "POST", path: `/api/v1/projects/${f.projectId}/drafts`, cookie, params: { projectId: f.projectId }, body: { plant: JSON.parse(demoFile("orchard-end-plant.json")) } }),
  },
  {
    name: "GET /api/v1/projects/[projectId]/emitter-list", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await emitterListRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/emitter-list`, cookie, params: { projectId: f.projectId } }),
  },
  {
    // the firm's own list sent back unchanged, so other rows see the same list
    name: "PUT /api/v1/projects/[projectId]/emitter-list", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await emitterListRoute()).PUT as never, { method: "PUT", path: `/api/v1/projects/${f.projectId}/emitter-list`, cookie, params: { projectId: f.projectId }, rawBody: demoFile("fernbank-emitters.csv"), contentType: "text/csv" }),
  },
  // ——— site sheet: installers and owners record, every member reads (issued revisions only) ———
  {
    name: "GET /api/v1/schematics/[id]/site issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await siteRoute()).GET as never, { path: "", cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    // no issued revision: no sheet (installers do not even see the schematic yet)
    name: "GET /api/v1/schematics/[id]/site draft only", kind: "route",
    expect: { owner: 404, designer: 404, reviewer: 404, installer: 403, trainee: 404, anon: 401 },
    call: async (f, cookie) => callRoute((await siteRoute()).GET as never, { path: "", cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "POST /api/v1/schematics/[id]/site/events issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(["owner", "installer"]),
    call: async (f, cookie) => callRoute((await siteEventsRoute()).POST as never, { method: "POST", path: "", cookie, params: { schematicId: f.teamSchematicId }, body: siteTick() }),
  },
  {
    name: "POST /api/v1/projects/[id]/uploads", kind: "route", expect: allow(["owner", "installer"], 201),
    call: async (f, cookie) => callRoute((await uploadsRoute()).POST as never, {
      method: "POST", path: "", cookie, params: { projectId: f.projectId }, body: { filename: "plant.jpg", contentType: "image/jpeg", size: 2048 },
    }),
  },
  {
    // the installer uploaded it; a project owner may complete it too
    name: "POST /api/v1/uploads/[id]/complete", kind: "route",
    expect: { owner: 200, designer: 403, reviewer: 403, installer: 200, trainee: 403, anon: 401 },
    prepare: (f) => fixturePhoto(f, "pending"),
    call: async (_f, cookie, _who, id) => callRoute((await completeRoute()).POST as never, { method: "POST", path: "", cookie, params: { uploadId: id! } }),
  },
  {
    name: "GET /api/v1/projects/[id]/attachments", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await attachmentsRoute()).GET as never, { path: "", cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "GET /api/v1/uploads/[id]/thumbnail", kind: "route", expect: { ...allow(members), anon: 401 },
    prepare: (f) => fixturePhoto(f, "listed"),
    call: async (_f, cookie, _who, id) => callRoute((await thumbnailRoute()).GET as never, { path: "", cookie, params: { uploadId: id! } }),
  },
  {
    name: "GET /api/v1/uploads/[id]/file (redirect to a presigned GET)", kind: "route", expect: { ...allow(members, 302), anon: 401 },
    prepare: (f) => fixturePhoto(f, "listed"),
    call: async (_f, cookie, _who, id) => callRoute((await fileRoute()).GET as never, { path: "", cookie, params: { uploadId: id! } }),
  },
  {
    // the fixture belongs to the shared demo firm: the owner saves the default rule, so other test files see no change
    name: "action saveSiteRulesAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await siteActions()).saveSiteRulesAction({ projectId: f.projectId,
      pressureTest: (await import("@/lib/site/pressure-test")).DEFAULT_PRESSURE_TEST_RULE }), cookie),
  },

  // ——— public account actions: the same answer whoever calls (no role involved) ———
  {
    name: "action signInAction (wrong password)", kind: "action", expect: same(400),
    call: async (_f, cookie) => callAction(async () => (await authActions()).signInAction(null, form({ email: `nobody-${randomUUID().slice(0, 8)}@example.test`, password: "wrong" })), cookie, randomIp()),
  },
  {
    name: "action signUpAction (invalid input)", kind: "action", expect: same(400),
    call: async (_f, cookie) => callAction(async () => (await authActions()).signUpAction(null, form({ name: "", email: "bad", password: "x", firm: "" })), cookie),
  },
  {
    name: "action forgotPasswordAction", kind: "action", expect: same(200),
    call: async (_f, cookie) => callAction(async () => (await authActions()).forgotPasswordAction(null, form({ email: `nobody-${randomUUID().slice(0, 8)}@example.test` })), cookie, randomIp()),
  },
  {
    name: "action resetPasswordAction (made-up token)", kind: "action", expect: same(400),
    call: async (_f, cookie) => callAction(async () => (await authActions()).resetPasswordAction(null, form({ token: "made-up-token", password: "long-enough-pw" })), cookie),
  },
  {
    name: "action inviteSignUpAction (made-up token)", kind: "action", expect: same(400),
    call: async (_f, cookie) => callAction(async () => (await authActions()).inviteSignUpAction(null, form({ token: "made-up-token", name: "X", password: "long-enough-pw" })), cookie),
  },
  {
    name: "action demoSignInAction (redirects to /projects)", kind: "action", expect: same(303),
    call: async (_f, cookie) => callAction(async () => (await authActions()).demoSignInAction(form({ role: "reviewer" })), cookie),
  },
  {
    name: "action signOutAction (redirects home)", kind: "action", expect: same(303),
    call: async (_f, _cookie, who) => callAction(async () => (await authActions()).signOutAction(form({})), await cookieFor(who)),
  },

  // ——— review: threads, history, approval path, live events ———
  {
    name: "GET /api/v1/projects/[projectId]/schematics", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await projectSchematicsRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/schematics`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/threads team, draft only", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await threadsRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}/threads`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/threads?revision=1 team, issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await threadsRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}/threads?revision=1`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/threads practice variant", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"])),
    call: async (f, cookie) => callRoute((await threadsRoute()).GET as never, { path: `/api/v1/schematics/${f.practiceSchematicId}/threads`, cookie, params: { schematicId: f.practiceSchematicId } }),
  },
  {
    name: "POST /api/v1/schematics/[id]/threads team, revision in draft", kind: "route", expect: allow(["owner", "designer", "reviewer"], 201),
    call: async (f, cookie) => callRoute((await threadsRoute()).POST as never, { method: "POST", path: `/api/v1/schematics/${f.teamSchematicId}/threads`, cookie,
      params: { schematicId: f.teamSchematicId }, body: { anchor: { kind: "schematic" }, body: "Matrix thread", revisionId: f.revisionId } }),
  },
  {
    // installers write on issued revisions (questions from site)
    name: "POST /api/v1/schematics/[id]/threads team, issued", kind: "route", fixture: { revisionStatus: "issued" },
    expect: allow(["owner", "designer", "reviewer", "installer"], 201),
    call: async (f, cookie) => callRoute((await threadsRoute()).POST as never, { method: "POST", path: `/api/v1/schematics/${f.teamSchematicId}/threads`, cookie,
      params: { schematicId: f.teamSchematicId }, body: { anchor: { kind: "schematic" }, body: "Matrix question from site" } }),
  },
  {
    name: "POST /api/v1/schematics/[id]/threads practice variant", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"], 201)),
    call: async (f, cookie) => callRoute((await threadsRoute()).POST as never, { method: "POST", path: `/api/v1/schematics/${f.practiceSchematicId}/threads`, cookie,
      params: { schematicId: f.practiceSchematicId }, body: { anchor: { kind: "schematic" }, body: "Matrix practice note" } }),
  },
  {
    name: "POST /api/v1/threads/[id]/replies team, revision in draft", kind: "route", expect: allow(["owner", "designer", "reviewer"], 201),
    call: async (f, cookie) => callRoute((await repliesRoute()).POST as never, { method: "POST", path: `/api/v1/threads/${f.threadId}/replies`, cookie,
      params: { threadId: f.threadId }, body: { body: "Matrix reply" } }),
  },
  {
    name: "POST /api/v1/threads/[id]/replies team, issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(["owner", "designer", "reviewer", "installer"], 201),
    call: async (f, cookie) => callRoute((await repliesRoute()).POST as never, { method: "POST", path: `/api/v1/threads/${f.threadId}/replies`, cookie,
      params: { threadId: f.threadId }, body: { body: "Matrix reply from site" } }),
  },
  {
    name: "POST /api/v1/threads/[id]/replies practice variant", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"], 201)),
    call: async (f, cookie) => callRoute((await repliesRoute()).POST as never, { method: "POST", path: `/api/v1/threads/${f.practiceThreadId}/replies`, cookie,
      params: { threadId: f.practiceThreadId }, body: { body: "Matrix practice reply" } }),
  },
  {
    name: "PATCH /api/v1/threads/[id] resolve", kind: "route", expect: allow(["owner", "designer", "reviewer"]),
    call: async (f, cookie) => callRoute((await threadRoute()).PATCH as never, { method: "PATCH", path: `/api/v1/threads/${f.threadId}`, cookie,
      params: { threadId: f.threadId }, body: { resolved: true } }),
  },
  {
    // the fixture's thread message is the reviewer's: only they may change it
    name: "PATCH /api/v1/messages/[id] (the reviewer's own)", kind: "route", expect: allow(["reviewer"]),
    call: async (f, cookie) => callRoute((await messageRoute()).PATCH as never, { method: "PATCH", path: `/api/v1/messages/${f.messageId}`, cookie,
      params: { messageId: f.messageId }, body: { body: "Edited by the matrix" } }),
  },
  {
    name: "DELETE /api/v1/messages/[id] (the reviewer's own)", kind: "route", expect: allow(["reviewer"]),
    call: async (f, cookie) => callRoute((await messageRoute()).DELETE as never, { method: "DELETE", path: `/api/v1/messages/${f.messageId}`, cookie,
      params: { messageId: f.messageId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/revisions team, draft only", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await historyRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}/revisions`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/revisions team, issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await historyRoute()).GET as never, { path: `/api/v1/schematics/${f.teamSchematicId}/revisions`, cookie, params: { schematicId: f.teamSchematicId } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/status draft → in-review (submit)", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await statusRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/status`, cookie,
      params: { revisionId: f.revisionId }, body: { status: "in-review" } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/status in-review → approved", kind: "route", fixture: { revisionStatus: "in-review" }, expect: allow(["owner", "reviewer"]),
    call: async (f, cookie) => callRoute((await statusRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/status`, cookie,
      params: { revisionId: f.revisionId }, body: { status: "approved" } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/status in-review → draft (send back, with a reason)", kind: "route", fixture: { revisionStatus: "in-review" }, expect: allow(["owner", "reviewer"]),
    call: async (f, cookie) => callRoute((await statusRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/status`, cookie,
      params: { revisionId: f.revisionId }, body: { status: "draft", reason: "The bypass opening is below the zones' design Δp." } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/status approved → issued", kind: "route", fixture: { revisionStatus: "approved" }, expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await statusRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/status`, cookie,
      params: { revisionId: f.revisionId }, body: { status: "issued" } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/restore", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await restoreRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/restore`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "POST /api/v1/revisions/[id]/restore practice variant", kind: "route", expect: practiceReaders(allow(["trainee"])),
    call: async (f, cookie) => callRoute((await restoreRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.practiceRevisionId}/restore`, cookie, params: { revisionId: f.practiceRevisionId } }),
  },
  {
    name: "GET /api/v1/schematics/[id]/events team, draft only", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => openStream(f.teamSchematicId, cookie),
  },
  {
    name: "GET /api/v1/schematics/[id]/events practice variant", kind: "route", expect: practiceReaders(allow(["owner", "reviewer", "trainee"])),
    call: async (f, cookie) => openStream(f.practiceSchematicId, cookie),
  },
  {
    // the demo owner owns the fixture's firm; setting the rule to what it is changes nothing for other tests
    name: "action setFirmReviewRuleAction", kind: "action", expect: allow(["owner"]),
    call: async (f, cookie) => callAction(async () => (await reviewActions()).setFirmReviewRuleAction({ projectId: f.projectId, noSelfApproval: true }), cookie),
  },

  // ——— handover pack (issue 12): report, materials, price list, send ———
  {
    // a draft's report (marked DRAFT): the schematic's readers; installers see issued revisions only
    name: "GET /api/v1/revisions/[id]/report.pdf draft", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await reportPdfRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}/report.pdf`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/revisions/[id]/report.pdf issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await reportPdfRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}/report.pdf`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/revisions/[id]/report (HTML) issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await reportHtmlRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}/report`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/revisions/[id]/materials.json draft", kind: "route", expect: { ...allow(members), installer: 403 },
    call: async (f, cookie) => callRoute((await materialsJsonRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}/materials.json`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/revisions/[id]/materials.csv issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(members),
    call: async (f, cookie) => callRoute((await materialsCsvRoute()).GET as never, { path: `/api/v1/revisions/${f.revisionId}/materials.csv?allowance=5`, cookie, params: { revisionId: f.revisionId } }),
  },
  {
    name: "GET /api/v1/projects/[projectId]/price-list", kind: "route", expect: allow(members),
    call: async (f, cookie) => callRoute((await priceListRoute()).GET as never, { path: `/api/v1/projects/${f.projectId}/price-list`, cookie, params: { projectId: f.projectId } }),
  },
  {
    name: "POST /api/v1/projects/[projectId]/price-list", kind: "route", expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await priceListRoute()).POST as never, { method: "POST", path: `/api/v1/projects/${f.projectId}/price-list`, cookie, params: { projectId: f.projectId },
      rawBody: "code,description,unit,price\nCU22,Copper tube 22 mm,m,4.10\n", contentType: "text/csv" }),
  },
  {
    name: "POST /api/v1/revisions/[id]/handover issued", kind: "route", fixture: { revisionStatus: "issued" }, expect: allow(["owner", "designer"]),
    call: async (f, cookie) => callRoute((await handoverRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/handover`, cookie,
      params: { revisionId: f.revisionId }, body: { to: `matrix-client-${f.projectId.slice(0, 8)}@example.test` } }),
  },

  // ——— TODO: board routes not written yet; replace each with a real row ———
];
