import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { HANDOVER_RECIPIENT_LIMIT, takeHandoverSend } from "@/lib/auth/rate-limit";
import { FIRST_CAUTION_LINE } from "@/lib/handover/cautions";
import { callRoute, cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture, type Fixture } from "./helpers/fixture";
import { mailTo } from "./helpers/mail";

// Send (issue 12): the issued revision's report e-mailed to the project's client address
// through the mail path (maildev catches it), the PDF attached, the cautions' first line in
// the body, and a handover row in the revision history.

const handoverRoute = () => import("@/app/api/v1/revisions/[revisionId]/handover/route");
const mailWeb = () => process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1081";
const send = async (f: Fixture, body: unknown, who: "owner" | "designer" | "installer" = "designer") =>
  callRoute((await handoverRoute()).POST as never, { method: "POST", path: `/api/v1/revisions/${f.revisionId}/handover`, cookie: await cookieFor(who),
    params: { revisionId: f.revisionId }, body });

let issued: Fixture;
let client = "";
beforeAll(async () => {
  issued = await makeFixture({ revisionStatus: "issued" });
  client = `client-${issued.projectId.slice(0, 8)}@example.test`;
  await db()("projects").where({ id: issued.projectId }).update({ client: "Weir Lane Trust (invented)", client_email: client });
});
afterAll(dropFixtures);

describe("handover e-mail", () => {
  it("arrives at the client's address with the report attached as a PDF and is logged in the history", async () => {
    const a = await send(issued, {});
    expect(a.status).toBe(200);
    expect(a.body.sent.to).toBe(client);
    const m = await mailTo(client, { subject: /^Handover report:/, timeoutMs: 10_000 });
    expect(m.text).toContain(FIRST_CAUTION_LINE);
    expect(m.text).toContain("attached as a PDF");
    const full = await (await fetch(`${mailWeb()}/api/email/${m.id}`)).json() as { attachments?: { contentType: string; generatedFileName: string; fileName?: string }[] };
    expect(full.attachments).toHaveLength(1);
    expect(full.attachments![0]!.contentType).toBe("application/pdf");
    const bytes = new Uint8Array(await (await fetch(`${mailWeb()}/api/email/${m.id}/attachment/${encodeURIComponent(full.attachments![0]!.generatedFileName)}`)).arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    const logged = await db()("revision_events").where({ revision_id: issued.revisionId, kind: "handover" }).first("detail", "actor_id");
    expect(logged.detail.to).toBe(client);
    expect(logged.actor_id).toBe("demo-designer");
  }, 30_000);

  it("goes to another address when one is given; refuses a bad one by field", async () => {
    const other = `engineer-${issued.projectId.slice(0, 8)}@example.test`;
    expect((await send(issued, { to: other }, "owner")).status).toBe(200);
    await mailTo(other, { subject: /^Handover report:/, timeoutMs: 10_000 });
    const bad = await send(issued, { to: "not an address" });
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe("to");
  }, 30_000);

  it("is refused with a 429 once an address has had its hourly budget, and nothing is sent or logged", async () => {
    const flooded = `flooded-${issued.projectId.slice(0, 8)}@example.test`;
    for (let i = 0; i < HANDOVER_RECIPIENT_LIMIT.points; i++) await takeHandoverSend(`someone-else-${i}`, flooded);
    const before = await db()("revision_events").where({ revision_id: issued.revisionId, kind: "handover" }).count<{ count: string }[]>("* as count");
    const r = await send(issued, { to: flooded });
    expect(r.status).toBe(429);
    expect(r.body.error).toContain(`${flooded} has been sent ${HANDOVER_RECIPIENT_LIMIT.points} handover e-mails in the last hour`);
    const after = await db()("revision_events").where({ revision_id: issued.revisionId, kind: "handover" }).count<{ count: string }[]>("* as count");
    expect(after[0]!.count).toBe(before[0]!.count);
    // another address is still served
    expect((await send(issued, { to: `fresh-${issued.projectId.slice(0, 8)}@example.test` })).status).toBe(200);
  }, 30_000);

  it("is refused for a revision not issued (409) and for a project without a client address (400)", async () => {
    const draft = await makeFixture({ revisionStatus: "approved" });
    expect((await send(draft, { to: "someone@example.test" })).status).toBe(409);
    const noAddress = await makeFixture({ revisionStatus: "issued" });
    const r = await send(noAddress, {});
    expect(r.status).toBe(400);
    expect(r.body.issues[0].path).toBe("to");
    expect(await db()("revision_events").where({ revision_id: noAddress.revisionId, kind: "handover" }).first()).toBeUndefined();
  }, 30_000);

  it("is sent only by owners and designers", async () => {
    expect((await send(issued, {}, "installer")).status).toBe(403);
  });
});
