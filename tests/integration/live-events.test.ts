import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { liveListener } from "@/lib/live/listener";
import * as events from "@/app/api/v1/schematics/[schematicId]/events/route";
import * as threads from "@/app/api/v1/schematics/[schematicId]/threads/route";
import * as status from "@/app/api/v1/revisions/[revisionId]/status/route";
import { callRoute } from "./helpers/call";
import { dropReviewProjects, makeReviewProject, type ReviewProject } from "./helpers/review-project";
import { SseReader } from "./helpers/sse";

// The live stream in one process, against PostgreSQL: what each viewer hears (threads,
// status moves, saved drafts, who is looking), what an installer does not hear, and a
// dropped LISTEN connection made again with a resync. Two instances: two-instances.test.ts.

const open = async (p: ReviewProject, cookie: string) => {
  const res = await (events.GET as never as (r: Request, c: unknown) => Promise<Response>)(
    new Request(`http://test.local/api/v1/schematics/${p.schematicId}/events`, { headers: { cookie } }), { params: Promise.resolve({ schematicId: p.schematicId }) });
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/^text\/event-stream/);
  expect(res.headers.get("cache-control")).toMatch(/no-transform/);
  return new SseReader(res);
};
const streams: SseReader[] = [];

beforeAll(() => { expect(process.env.DATABASE_URL ?? "").toMatch(/_test$/); });
afterAll(async () => {
  for (const s of streams) await s.close();
  await liveListener().close();
  await dropReviewProjects();
  await db().destroy();
  await pgPool().end();
});

describe("a board's live stream", () => {
  it("says who is looking, and tells of new threads, status moves and saved drafts", async () => {
    const p = await makeReviewProject("in-review");
    const designer = await open(p, p.people.designer.cookie);
    streams.push(designer);
    const hello = await designer.next((e) => e.event === "hello");
    expect(hello.data.you).toBe(p.people.designer.id);
    await designer.next((e) => e.event === "presence" && e.data.people.length === 1);
    const reviewer = await open(p, p.people.reviewer.cookie);
    streams.push(reviewer);
    const both = await designer.next((e) => e.event === "presence" && e.data.people.length === 2);
    expect(both.data.people.map((x: { initials: string }) => x.initials).sort()).toEqual(["IM", "TR"]);

    const posted = await callRoute(threads.POST as never, { method: "POST", path: "", cookie: p.people.reviewer.cookie, params: { schematicId: p.schematicId },
      body: { anchor: { kind: "pipe", id: "z1-f0" }, body: "Live?" } });
    const heard = await designer.next((e) => e.event === "thread");
    expect(heard.data).toEqual({ threadId: posted.body.thread.id, revisionId: p.rev1 });

    await callRoute(status.POST as never, { method: "POST", path: "", cookie: p.people.reviewer.cookie, params: { revisionId: p.rev1 }, body: { status: "approved" } });
    expect((await designer.next((e) => e.event === "revision")).data).toEqual({ revisionId: p.rev1, status: "approved" });

    await db()("schematics").where({ id: p.schematicId }).update({ draft: p.doc, lock_version: db().raw("lock_version + 1"), updated_by: p.people.designer.id });
    const draft = await reviewer.next((e) => e.event === "draft");
    expect(draft.data).toEqual({ lockVersion: 2, by: p.people.designer.id });

    // the reviewer leaves: the designer sees one person again
    await reviewer.close();
    await designer.next((e) => e.event === "presence" && e.data.people.length === 1, 5000);
  });

  it("an installer hears only of issued revisions, never of the draft", async () => {
    const p = await makeReviewProject("issued");
    const installer = await open(p, p.people.installer.cookie);
    streams.push(installer);
    await installer.next((e) => e.event === "hello");
    const [rev2] = await db()("schematic_revisions").insert({ schematic_id: p.schematicId, number: 2, document: p.doc, status: "draft", author_id: p.people.designer.id }).returning("id");
    await db()("schematics").where({ id: p.schematicId }).update({ lock_version: db().raw("lock_version + 1") });
    await db()("review_threads").insert({ schematic_id: p.schematicId, revision_id: rev2.id, number: 1, anchor_kind: "schematic" });
    const [onIssued] = await db()("review_threads").insert({ schematic_id: p.schematicId, revision_id: p.rev1, number: 2, anchor_kind: "schematic" }).returning("id");
    const heard = await installer.next((e) => e.event === "thread");
    expect(heard.data.threadId).toBe(onIssued.id);
    expect(installer.events.map((e) => e.event).filter((e) => e !== "presence")).toEqual(["hello", "thread"]);
  });

  it("a dropped LISTEN connection ends the streams (their browsers reconnect and refetch); the next stream listens again", async () => {
    const p = await makeReviewProject("draft");
    const s = await open(p, p.people.owner.cookie);
    streams.push(s);
    await s.next((e) => e.event === "hello");
    await liveListener().dropForTest();
    await expect.poll(() => s.closed, { timeout: 5000 }).toBe(true);
    await expect.poll(() => db()("board_presence").where({ schematic_id: p.schematicId }), { timeout: 5000 }).toEqual([]); // gone from the presence list
    const again = await open(p, p.people.owner.cookie);
    streams.push(again);
    await again.next((e) => e.event === "hello");
    await db()("review_threads").insert({ schematic_id: p.schematicId, revision_id: p.rev1, number: 1, anchor_kind: "schematic" });
    await again.next((e) => e.event === "thread");
  });
});
