import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { AuthError, requireSchematicAccess } from "@/lib/auth/authorize";
import { withRequestCookies } from "@/lib/auth/request-context";
import { liveListener } from "@/lib/live/listener";
import * as status from "@/app/api/v1/revisions/[revisionId]/status/route";
import * as restore from "@/app/api/v1/revisions/[revisionId]/restore/route";
import * as history from "@/app/api/v1/schematics/[schematicId]/revisions/route";
import * as schematics from "@/app/api/v1/projects/[projectId]/schematics/route";
import * as threads from "@/app/api/v1/schematics/[schematicId]/threads/route";
import { setFirmReviewRuleAction } from "@/components/review/actions";
import { callAction, callRoute } from "./helpers/call";
import { mailsTo, waitForMails } from "./helpers/mail";
import { dropReviewProjects, makeReviewProject, type ReviewProject } from "./helpers/review-project";

// The approval path through POST /api/v1/revisions/{id}/status: submit, send back (the
// reason becomes a thread), approve, issue — each one e-mail to each member concerned, each
// a history row; the firm's rule on approving one's own revision, enforced on the server;
// the history with its changes; restoring an old revision as the draft; and the list of
// schematics a caller may read, held to lib/auth's read rule.

const move = (revisionId: string, cookie: string, body: unknown) =>
  callRoute(status.POST as never, { method: "POST", path: `/api/v1/revisions/${revisionId}/status`, cookie, params: { revisionId }, body });
const historyOf = (p: ReviewProject, cookie: string) =>
  callRoute(history.GET as never, { path: `/api/v1/schematics/${p.schematicId}/revisions`, cookie, params: { schematicId: p.schematicId } });
const mailCount = async (p: ReviewProject) => Object.fromEntries(await Promise.all(Object.entries(p.people).map(async ([r, u]) => [r, (await mailsTo(u.email)).length])));

beforeAll(() => { expect(process.env.DATABASE_URL ?? "").toMatch(/_test$/); });
afterAll(async () => {
  await liveListener().close();
  await dropReviewProjects();
  await db().destroy();
  await pgPool().end();
});

describe("the approval path, told", () => {
  it("submit → send back (reason required, becomes a thread) → submit → approve → issue: one e-mail each to those concerned, each in the history", async () => {
    const p = await makeReviewProject("draft");
    const { designer, reviewer, owner, installer, trainee } = p.people;

    expect((await move(p.rev1, designer.cookie, { status: "in-review" })).status).toBe(200);
    let mail = await waitForMails(reviewer.email, 1);
    expect(mail.map((m) => m.subject)).toEqual(["Rev 1 of Plant room is ready for review"]);
    expect(mail[0]!.text).toContain(`/projects/${p.projectId}/schematics/${p.schematicId}?rev=${p.rev1}`);

    const noReason = await move(p.rev1, reviewer.cookie, { status: "draft", reason: "  " });
    expect(noReason.status).toBe(400);
    expect(noReason.body.issues[0].path).toBe("reason");
    expect((await db()("schematic_revisions").where({ id: p.rev1 }).first()).status).toBe("in-review"); // unchanged
    const back = await move(p.rev1, reviewer.cookie, { status: "draft", reason: "The bypass opens below the zones' Δp; see https://example.test/note <b>x</b>" });
    expect(back.status).toBe(200);
    expect(back.body.revision.status).toBe("draft");
    const t = await db()("review_threads").where({ id: back.body.threadId }).first();
    expect(t).toMatchObject({ kind: "send-back", anchor_kind: "schematic", revision_id: p.rev1, created_by: reviewer.id });
    mail = await waitForMails(designer.email, 1);
    expect(mail.map((m) => m.subject)).toEqual(["Rev 1 of Plant room was sent back"]);
    expect(mail[0]!.text).toContain("The bypass opens below the zones' Δp");
    expect(mail[0]!.text).toContain(`?thread=${back.body.threadId}`);
    expect(mail[0]!.html).toContain("&lt;b&gt;x&lt;/b&gt;"); // the reason is text, even in the HTML e-mail

    await move(p.rev1, designer.cookie, { status: "in-review" });
    const approved = await move(p.rev1, reviewer.cookie, { status: "approved" });
    expect(approved.status).toBe(200);
    const issued = await move(p.rev1, designer.cookie, { status: "issued" });
    expect(issued.status).toBe(200);
    // reviewer: 2 submissions + issue; designer: send back, approval; owner and trainee: none; installer: issue
    const got = Object.fromEntries(await Promise.all(Object.entries({ designer, reviewer, installer, owner, trainee }).map(async ([r, u]) =>
      [r, (await waitForMails(u.email, r === "reviewer" ? 3 : r === "designer" ? 2 : r === "installer" ? 1 : 0, 3000)).map((m) => m.subject)])));
    expect(got).toEqual({
      designer: ["Rev 1 of Plant room was sent back", "Rev 1 of Plant room was approved"],
      reviewer: ["Rev 1 of Plant room is ready for review", "Rev 1 of Plant room is ready for review", "Rev 1 of Plant room was issued"],
      installer: ["Rev 1 of Plant room was issued"], owner: [], trainee: [],
    });

    const h = await historyOf(p, owner.cookie);
    expect(h.status).toBe(200);
    const events = h.body[0].events.map((e: { from: string; to: string; actorName: string; reason: string | null }) => `${e.from}→${e.to} by ${e.actorName}${e.reason ? `: ${e.reason.slice(0, 16)}` : ""}`);
    expect(events).toEqual(["draft→in-review by Ivo Marsh", "in-review→draft by Tamsin Reyes: The bypass opens", "draft→in-review by Ivo Marsh",
      "in-review→approved by Tamsin Reyes", "approved→issued by Ivo Marsh"]);
  });

  it("moves the workflow does not allow are 409 naming the field; nothing changes and nothing is sent", async () => {
    const p = await makeReviewProject("draft");
    const before = await mailCount(p);
    const skip = await move(p.rev1, p.people.designer.cookie, { status: "issued" });
    expect(skip.status).toBe(409);
    expect(skip.body.error).toMatch(/^status: a revision cannot move from draft to issued/);
    const bad = await move(p.rev1, p.people.designer.cookie, { status: "done" });
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("status");
    expect((await db()("schematic_revisions").where({ id: p.rev1 }).first()).status).toBe("draft");
    expect(await db()("revision_events").where({ revision_id: p.rev1 })).toEqual([]);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailCount(p)).toEqual(before);
  });

  it("the firm's rule: a reviewer may not approve a revision they authored (on by default, enforced on the server)", async () => {
    const p = await makeReviewProject("in-review");
    await db()("schematic_revisions").where({ id: p.rev1 }).update({ author_id: p.people.owner.id });
    const refused = await move(p.rev1, p.people.owner.cookie, { status: "approved" });
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatch(/may not approve a revision they authored/);
    expect((await db()("schematic_revisions").where({ id: p.rev1 }).first()).status).toBe("in-review");
    // only a firm owner may change the rule; with it off, the author may approve
    expect((await callAction(() => setFirmReviewRuleAction({ projectId: p.projectId, noSelfApproval: false }), p.people.reviewer.cookie)).status).toBe(403);
    expect((await callAction(() => setFirmReviewRuleAction({ projectId: p.projectId, noSelfApproval: false }), p.people.owner.cookie)).status).toBe(200);
    expect((await move(p.rev1, p.people.owner.cookie, { status: "approved" })).status).toBe(200);
  });
});

describe("history and restore", () => {
  it("lists every revision newest first with what changed from the one before (parts, pipes, which props); restores an old one as the draft", async () => {
    const p = await makeReviewProject("approved");
    const doc2 = structuredClone(p.doc) as { parts: { id: string; x: number; props: Record<string, unknown> }[]; pipes: { id: string; lengthM: number; from: string; to: string }[] };
    doc2.parts.find((x) => x.id === "rad-lounge")!.props.heatLoadW = 2400;
    doc2.parts.find((x) => x.id === "hp")!.x += 100;
    doc2.pipes.find((x) => x.id === "z1-f0")!.lengthM = 9;
    doc2.pipes = doc2.pipes.filter((x) => x.id !== "acc-dc");
    doc2.parts.push({ id: "rad-new", type: "radiator", x: 0, y: 0, props: {} } as never);
    await db()("schematic_revisions").insert({ schematic_id: p.schematicId, number: 2, document: doc2, status: "draft", message: "Bigger lounge load", author_id: p.people.designer.id });
    await db()("schematics").where({ id: p.schematicId }).update({ draft: doc2 });

    const h = await historyOf(p, p.people.reviewer.cookie);
    expect(h.body.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(h.body[0]).toMatchObject({ status: "draft", message: "Bigger lounge load", authorId: p.people.designer.id });
    expect(h.body[0].changes.added).toEqual(["rad-new"]);
    expect(h.body[0].changes.removed).toEqual(["acc-dc"]);
    expect(h.body[0].changes.changed).toEqual(expect.arrayContaining([{ id: "rad-lounge", fields: ["heatLoadW"] }, { id: "hp", fields: ["position"] }, { id: "z1-f0", fields: ["lengthM"] }]));
    expect(h.body[0].changes.changed).toHaveLength(3);
    const first = p.doc as { parts: unknown[]; pipes: unknown[] };
    expect(h.body[1].changes.added.length).toBe(first.parts.length + first.pipes.length);

    const lockBefore = (await db()("schematics").where({ id: p.schematicId }).first()).lock_version;
    const r = await callRoute(restore.POST as never, { method: "POST", path: `/api/v1/revisions/${p.rev1}/restore`, cookie: p.people.designer.cookie, params: { revisionId: p.rev1 } });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ schematicId: p.schematicId, lockVersion: lockBefore + 1, restoredFrom: { id: p.rev1, number: 1 } });
    const draft = (await db()("schematics").where({ id: p.schematicId }).first()).draft;
    expect(draft.pipes.find((x: { id: string }) => x.id === "z1-f0").lengthM).toBe(6);
    expect(draft.parts.some((x: { id: string }) => x.id === "rad-new")).toBe(false);
    // revisions stay as they were; the restore is in the history
    expect((await db()("schematic_revisions").where({ schematic_id: p.schematicId })).length).toBe(2);
    const after = await historyOf(p, p.people.designer.cookie);
    expect(after.body[1].events.map((e: { kind: string; actorName: string }) => `${e.kind} by ${e.actorName}`)).toEqual(["restored by Ivo Marsh"]);
    // a reviewer may not restore
    const no = await callRoute(restore.POST as never, { method: "POST", path: `/api/v1/revisions/${p.rev1}/restore`, cookie: p.people.reviewer.cookie, params: { revisionId: p.rev1 } });
    expect(no.status).toBe(403);
  });
});

describe("GET /api/v1/projects/{id}/schematics", () => {
  it("lists exactly the schematics each member may read, with the latest revision they may see", async () => {
    const p = await makeReviewProject("approved");
    await db()("schematic_revisions").insert({ schematic_id: p.schematicId, number: 2, document: p.doc, status: "issued", author_id: p.people.designer.id });
    await db()("schematic_revisions").insert({ schematic_id: p.schematicId, number: 3, document: p.doc, status: "draft", author_id: p.people.designer.id });
    const [bare] = await db()("schematics").insert({ project_id: p.projectId, name: "No revision yet", kind: "team", owner_id: p.people.designer.id, draft: p.doc }).returning("id");
    for (const [role, u] of Object.entries(p.people)) {
      const out = await callRoute(schematics.GET as never, { path: `/api/v1/projects/${p.projectId}/schematics`, cookie: u.cookie, params: { projectId: p.projectId } });
      expect(out.status).toBe(200);
      const listed = new Set(out.body.schematics.map((s: { id: string }) => s.id));
      // held to lib/auth's read rule, schematic by schematic
      for (const id of [p.schematicId, p.practiceId, bare.id]) {
        const may = await withRequestCookies(u.cookie, () => requireSchematicAccess(id, "read")).then(() => true, (e) => { if (e instanceof AuthError) return false; throw e; });
        expect(listed.has(id), `${role} on ${id}`).toBe(may);
      }
      const team = out.body.schematics.find((s: { id: string }) => s.id === p.schematicId);
      expect(team.latestRevision.number, role).toBe(role === "installer" ? 2 : 3);
      expect(Object.keys(team).sort()).toEqual(["id", "kind", "latestRevision", "name", "ownerId", "variantOf"]);
    }
    const anon = await callRoute(schematics.GET as never, { path: `/api/v1/projects/${p.projectId}/schematics`, cookie: null, params: { projectId: p.projectId } });
    expect(anon.status).toBe(401);
    // and a thread list for an installer holds threads on issued revisions only
    await db()("review_threads").insert({ schematic_id: p.schematicId, revision_id: p.rev1, number: 1, anchor_kind: "schematic" });
    const seen = await callRoute(threads.GET as never, { path: `/api/v1/schematics/${p.schematicId}/threads`, cookie: p.people.installer.cookie, params: { schematicId: p.schematicId } });
    expect(seen.status).toBe(200);
    expect(seen.body.threads).toEqual([]);
  });
});
