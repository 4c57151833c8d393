import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { ACCOUNT_LIMIT, ADDRESS_LIMIT, RESET_ACCOUNT_LIMIT, RESET_ADDRESS_LIMIT, limiterKey, takeSignInAttempt } from "@/lib/auth/rate-limit";
import { laterSettled } from "@/lib/later";
import * as auth from "@/components/auth/actions";
import * as team from "@/components/team/actions";
import * as projects from "@/app/api/v1/projects/route";
import * as projectItem from "@/app/api/v1/projects/[projectId]/route";
import { callAction, callRoute, cookieFor, cookieFromSetCookies, form } from "./helpers/call";
import { dropFixtures, makeFixture } from "./helpers/fixture";
import { linkIn, mailTo } from "./helpers/mail";
import { signUpAndConfirm } from "./helpers/accounts";

// Accounts end to end through the real server actions and routes, against PostgreSQL and
// the SMTP catcher: sign up, sign in/out, rate limits, password change and reset,
// invitations, bad input, and the audit log.

const uniq = () => randomUUID().slice(0, 8);
const made: string[] = [];
const email = (tag: string) => { const e = `${tag}-${uniq()}@example.test`; made.push(e); return e; };
const ip = () => `10.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

async function whoAmI(cookie: string | null) {
  return callRoute(projects.GET as never, { path: "/api/v1/projects", cookie });
}
async function auditRows(action: string, target?: string) {
  const q = db()("audit_log").where({ action });
  if (target) q.andWhere({ target });
  return q.select("*");
}

beforeAll(() => { expect(process.env.DATABASE_URL ?? "").toMatch(/_test$/); });
afterAll(async () => {
  await laterSettled();
  await dropFixtures();
  await db()("users").whereIn("email", made).delete();
  await db()("sign_up_requests").whereIn("email", made).delete();
  await db()("organisations").where("name", "like", "Test firm %").delete();
  await db().destroy();
  await pgPool().end();
});

describe("sign up, sign in, sign out", () => {
  it("a new person signs up with a firm: e-mailed link, then signed in, and owns new projects", async () => {
    const addr = email("signup");
    const asked = await callAction(() => auth.signUpAction(null, form({ name: "Ada Flux", email: addr.toUpperCase(), password: "long-enough-pw", firm: `Test firm ${uniq()}` })), null, ip());
    expect(asked.status).toBe(200);
    expect(asked.body.data).toMatch(/Check your e-mail/);
    expect(asked.setCookies).toEqual([]); // not signed in before the link is opened
    expect(await db()("users").where({ email: addr }).first()).toBeUndefined();
    const mail = await mailTo(addr, { subject: "Finish creating your Loopwright account" });
    const token = linkIn(mail.text, "/sign-up");
    expect((await db()("sign_up_requests").where({ email: addr }).first()).token_hash).not.toContain(token); // only the hash is stored
    const out = await callAction(() => auth.confirmSignUpAction(null, form({ token })), null);
    expect(out.status).toBe(303);
    expect(out.redirect).toBe("/projects?welcome=1");
    const setCookie = out.setCookies.find((c) => c.startsWith("lw_session="))!;
    expect(setCookie).toMatch(/HttpOnly/);
    expect(setCookie).toMatch(/SameSite=Lax/);
    const cookie = cookieFromSetCookies(out.setCookies);
    expect((await whoAmI(cookie)).status).toBe(200);
    const created = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie, body: { name: "Ada's first job" } });
    expect(created.status).toBe(201);
    const role = await db()("project_members").where({ project_id: created.body.project.id }).first();
    expect(role.role).toBe("owner");
    expect((await db()("users").where({ email: addr }).first()).email).toBe(addr); // stored lower-case
    const again = await callAction(() => auth.confirmSignUpAction(null, form({ token })), null);
    expect(again.status).toBe(400);
    expect(again.body.error).toMatch(/already been used/);
  });

  it("signs in with the right password, audits it, and signs out", async () => {
    const out = await callAction(() => auth.signInAction(null, form({ email: "Designer@Fernbank.example", password: "copper-loop-designer", next: "/projects/x" })), null, ip());
    expect(out.status).toBe(303);
    expect(out.redirect).toBe("/projects/x");
    const cookie = cookieFromSetCookies(out.setCookies);
    expect((await whoAmI(cookie)).status).toBe(200);
    const bye = await callAction(() => auth.signOutAction(), cookie);
    expect(bye.redirect).toBe("/");
    expect((await whoAmI(cookie)).status).toBe(401);
    expect((await auditRows("auth.sign-out")).some((r) => r.actor_id === "demo-designer")).toBe(true);
    expect((await auditRows("auth.sign-in")).some((r) => r.actor_id === "demo-designer")).toBe(true);
  });

  it("refuses an off-site next= and goes to /projects instead", async () => {
    const out = await callAction(() => auth.signInAction(null, form({ email: "reviewer@fernbank.example", password: "copper-loop-reviewer", next: "//evil.example/x" })), null, ip());
    expect(out.redirect).toBe("/projects");
  });

  it("a wrong password is a 400 with a message, audited as a failure", async () => {
    const out = await callAction(() => auth.signInAction(null, form({ email: "owner@fernbank.example", password: "nope" })), null, ip());
    expect(out.status).toBe(400);
    expect(out.body.error).toMatch(/do not match/);
    expect(out.setCookies).toEqual([]);
    expect((await auditRows("auth.sign-in-failed", "owner@fernbank.example")).length).toBeGreaterThan(0);
    await db()("rate_limits").where("key", `signin-account:${limiterKey("owner@fernbank.example")}`).delete();
  });

  it("signed-out calls to the API are 401 with a message", async () => {
    const out = await whoAmI(null);
    expect(out.status).toBe(401);
    expect(out.body.error).toMatch(/sign in/i);
  });

  it("a forged or expired session cookie is 401 and the cookie is cleared", async () => {
    const out = await whoAmI("lw_session=not-a-real-session");
    expect(out.status).toBe(401);
    expect(out.setCookies.some((c) => c.startsWith("lw_session=;") || c.startsWith("lw_session= ") || /^lw_session=(;|$)/.test(c))).toBe(true);
  });
});

describe("rate limits on sign-in", () => {
  it("locks an account after repeated failures, with a clear 429, even with the right password", async () => {
    const addr = email("locked");
    await signUpAndConfirm({ name: "Lock Test", email: addr, password: "right-password-1", firm: `Test firm ${uniq()}` });
    for (let i = 0; i < ACCOUNT_LIMIT.points; i++) {
      const bad = await callAction(() => auth.signInAction(null, form({ email: addr, password: `wrong-${i}` })), null, ip());
      expect(bad.status).toBe(400);
    }
    const locked = await callAction(() => auth.signInAction(null, form({ email: addr, password: "right-password-1" })), null, ip());
    expect(locked.status).toBe(429);
    expect(locked.body.error).toMatch(/Too many failed sign-ins for this account\. Try again in \d+ minutes?/);
    const rows = await db()("rate_limits").where("key", `signin-account:${limiterKey(addr)}`);
    expect(rows.length).toBe(1); // the counter is in PostgreSQL, keyed by a hash of the address
  });

  it("limits one address trying many accounts", async () => {
    const from = ip();
    // one real failure through the action, the rest straight into the shared counter (fast)
    await callAction(() => auth.signInAction(null, form({ email: email("spray"), password: "x" })), null, from);
    for (let i = 1; i < ADDRESS_LIMIT.points; i++) await takeSignInAttempt(email("spray"), from);
    const out = await callAction(() => auth.signInAction(null, form({ email: "trainee@fernbank.example", password: "copper-loop-trainee" })), null, from);
    expect(out.status).toBe(429);
    expect(out.body.error).toMatch(/from your network/);
  });
});

describe("password change and reset", () => {
  it("changes the password: old sessions end, the new password works", async () => {
    const addr = email("change");
    const oldCookie = await signUpAndConfirm({ name: "Cee", email: addr, password: "first-password-1", firm: `Test firm ${uniq()}` });
    const changed = await callAction(() => auth.changePasswordAction(null, form({ current: "first-password-1", password: "second-password-2" })), oldCookie);
    expect(changed.status).toBe(200);
    expect((await whoAmI(oldCookie)).status).toBe(401);
    expect((await whoAmI(cookieFromSetCookies(changed.setCookies))).status).toBe(200);
    const signIn = await callAction(() => auth.signInAction(null, form({ email: addr, password: "second-password-2" })), null, ip());
    expect(signIn.status).toBe(303);
  });

  it("rejects a too-short new password naming the field", async () => {
    const cookie = await cookieFor("designer");
    const out = await callAction(() => auth.changePasswordAction(null, form({ current: "copper-loop-designer", password: "short" })), cookie);
    expect(out.status).toBe(400);
    expect(out.body.issues[0]).toEqual({ path: "password", message: "Password must be at least 10 characters." });
  });

  it("resets by e-mail: the link works once, and signs in with the new password", async () => {
    const addr = email("reset");
    await signUpAndConfirm({ name: "Dee", email: addr, password: "forgotten-pw-1", firm: `Test firm ${uniq()}` });
    const asked = await callAction(() => auth.forgotPasswordAction(null, form({ email: addr })), null, ip());
    expect(asked.status).toBe(200);
    const mail = await mailTo(addr, { subject: "Reset your Loopwright password" });
    expect(mail.subject).toBe("Reset your Loopwright password");
    expect(mail.html).toContain("Choose a new password");
    const token = linkIn(mail.text, "/reset-password");
    const stored = await db()("password_resets").join("users", "users.id", "password_resets.user_id").where("users.email", addr).first("token_hash");
    expect(stored.token_hash).not.toContain(token); // only the hash is stored
    const done = await callAction(() => auth.resetPasswordAction(null, form({ token, password: "remembered-pw-2" })), null);
    expect(done.status).toBe(303);
    const again = await callAction(() => auth.resetPasswordAction(null, form({ token, password: "another-pw-3333" })), null);
    expect(again.status).toBe(400);
    expect(again.body.error).toMatch(/already been used/);
    const signIn = await callAction(() => auth.signInAction(null, form({ email: addr, password: "remembered-pw-2" })), null, ip());
    expect(signIn.status).toBe(303);
  });

  it("answers the same for an unknown address (no account discovery)", async () => {
    const out = await callAction(() => auth.forgotPasswordAction(null, form({ email: email("nobody") })), null);
    expect(out.status).toBe(200);
    expect(out.body.data).toMatch(/If .* has a Loopwright account/);
  });

  it("wrong and expired reset tokens are clear 400s", async () => {
    const wrong = await callAction(() => auth.resetPasswordAction(null, form({ token: "x".repeat(43), password: "a-fresh-copper-pipe-1" })), null);
    expect(wrong.status).toBe(400);
    expect(wrong.body.error).toMatch(/not valid/);
    const addr = email("expired");
    await signUpAndConfirm({ name: "Eve", email: addr, password: "forgotten-pw-1", firm: `Test firm ${uniq()}` });
    await callAction(() => auth.forgotPasswordAction(null, form({ email: addr })), null, ip());
    const token = linkIn((await mailTo(addr, { subject: "Reset your Loopwright password" })).text, "/reset-password");
    await db()("password_resets").whereIn("user_id", db()("users").where({ email: addr }).select("id")).update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await callAction(() => auth.resetPasswordAction(null, form({ token, password: "a-fresh-copper-pipe-1" })), null);
    expect(expired.status).toBe(400);
    expect(expired.body.error).toMatch(/expired/);
  });
});

describe("invitations", () => {
  it("owner invites; the e-mail link signs a new person up straight into the project; the link works once", async () => {
    const f = await makeFixture();
    const owner = await cookieFor("owner");
    const addr = email("invitee");
    const sent = await callAction(() => team.inviteAction(null, form({ projectId: f.projectId, email: addr, role: "installer" })), owner);
    expect(sent.status).toBe(200);
    const mail = await mailTo(addr);
    expect(mail.subject).toBe(`Rowan Hale invited you to ${f.projectName} on Loopwright`);
    expect(mail.text).toMatch(/as installer/);
    const token = linkIn(mail.text, "/invite");
    const joined = await callAction(() => auth.inviteSignUpAction(null, form({ token, name: "Ivy New", password: "a-good-password" })), null);
    expect(joined.status).toBe(303);
    expect(joined.redirect).toBe(`/projects/${f.projectId}/team?joined=1`);
    const user = await db()("users").where({ email: addr }).first();
    expect((await db()("project_members").where({ project_id: f.projectId, user_id: user.id }).first()).role).toBe("installer");
    expect(await db()("memberships").where({ user_id: user.id }).first()).toBeTruthy();
    const reuse = await callAction(() => auth.inviteSignUpAction(null, form({ token, name: "Mallory", password: "a-good-password" })), null);
    expect(reuse.status).toBe(400);
    expect(reuse.body.error).toMatch(/already been used/);
    expect((await auditRows("invitation.sent", addr)).length).toBe(1);
    expect((await auditRows("invitation.accepted", addr)).length).toBe(1);
  });

  it("expired, revoked and made-up invitation tokens are clear 400s", async () => {
    const f = await makeFixture();
    await db()("invitations").where({ id: f.invitationId }).update({ expires_at: new Date(Date.now() - 1000) });
    const expired = await callAction(() => auth.inviteSignUpAction(null, form({ token: f.invitationToken, name: "Late", password: "a-good-password" })), null);
    expect(expired.status).toBe(400);
    expect(expired.body.error).toMatch(/expired/);

    const g = await makeFixture();
    await callAction(() => team.revokeInvitationAction(null, form({ projectId: g.projectId, invitationId: g.invitationId })), await cookieFor("owner"));
    const revoked = await callAction(() => auth.inviteSignUpAction(null, form({ token: g.invitationToken, name: "Late", password: "a-good-password" })), null);
    expect(revoked.body.error).toMatch(/withdrawn/);

    const madeUp = await callAction(() => auth.inviteSignUpAction(null, form({ token: "made-up", name: "X", password: "a-good-password" })), null);
    expect(madeUp.status).toBe(400);
    expect(madeUp.body.error).toMatch(/not valid/);
  });

  it("an existing member cannot be invited again; bad e-mail and role name their field", async () => {
    const f = await makeFixture();
    const owner = await cookieFor("owner");
    const dup = await callAction(() => team.inviteAction(null, form({ projectId: f.projectId, email: "trainee@fernbank.example", role: "designer" })), owner);
    expect(dup.status).toBe(409);
    const bad = await callAction(() => team.inviteAction(null, form({ projectId: f.projectId, email: "not an e-mail", role: "wizard" })), owner);
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path)).toEqual(["email", "role"]);
    expect(bad.body.issues[0].message).toMatch(/E-mail address/);
    const long = await callAction(() => team.inviteAction(null, form({ projectId: f.projectId, email: `${"a".repeat(250)}@example.test`, role: "designer" })), owner);
    expect(long.body.issues[0].message).toMatch(/at most 254/);
  });

  it("role changes and removals are audited; the last owner cannot be demoted", async () => {
    const f = await makeFixture();
    const owner = await cookieFor("owner");
    const changed = await callAction(() => team.changeRoleAction(null, form({ projectId: f.projectId, userId: "demo-trainee", role: "designer" })), owner);
    expect(changed.status).toBe(200);
    const [row] = await db()("audit_log").where({ action: "member.role", project_id: f.projectId });
    expect(row.detail).toEqual({ from: "trainee", to: "designer" });
    const lastOwner = await callAction(() => team.changeRoleAction(null, form({ projectId: f.projectId, userId: "demo-owner", role: "designer" })), owner);
    expect(lastOwner.status).toBe(409);
    expect(lastOwner.body.error).toMatch(/at least one owner/);
  });
});

describe("projects API input and deletion", () => {
  it("validates the body: bad JSON, missing and over-long names are 400s naming the field", async () => {
    const cookie = await cookieFor("designer");
    const badJson = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie, rawBody: "{nope" });
    expect(badJson.status).toBe(400);
    expect(badJson.body.error).toMatch(/not valid JSON/);
    const missing = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie, body: {} });
    expect(missing.status).toBe(400);
    expect(missing.body.issues[0].path).toBe("name");
    const long = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie, body: { name: "x".repeat(161) } });
    expect(long.body.issues[0]).toEqual({ path: "name", message: "Project name must be at most 160 characters." });
  });

  it("an unknown or malformed project id is 404, not 500", async () => {
    const cookie = await cookieFor("owner");
    for (const id of ["not-a-uuid", randomUUID()]) {
      const out = await callRoute(projectItem.GET as never, { path: `/api/v1/projects/${id}`, cookie, params: { projectId: id } });
      expect(out.status).toBe(404);
      expect(out.body.error).toMatch(/not found/i);
    }
  });

  it("lists only the caller's projects", async () => {
    const f = await makeFixture();
    await db()("project_members").where({ project_id: f.projectId, user_id: "demo-reviewer" }).delete();
    const out = await whoAmI(await cookieFor("reviewer"));
    expect(out.body.projects.map((p: { id: string }) => p.id)).not.toContain(f.projectId);
    const mine = await whoAmI(await cookieFor("owner"));
    expect(mine.body.projects.map((p: { id: string }) => p.id)).toContain(f.projectId);
  });

  it("deleting a project is audited with its name", async () => {
    const f = await makeFixture();
    const out = await callRoute(projectItem.DELETE as never, { method: "DELETE", path: `/api/v1/projects/${f.projectId}`, cookie: await cookieFor("owner"), params: { projectId: f.projectId } });
    expect(out.status).toBe(204);
    const [row] = await auditRows("project.deleted", f.projectId);
    expect(row.detail.name).toBe(f.projectName);
    expect(row.actor_id).toBe("demo-owner");
  });
});

describe("password reset requests are limited", () => {
  it("sends at most a few e-mails per account per hour, without saying so", async () => {
    const addr = email("flood");
    await signUpAndConfirm({ name: "Flo", email: addr, password: "flood-password-1", firm: `Test firm ${uniq()}` });
    for (let i = 0; i < RESET_ACCOUNT_LIMIT.points + 2; i++) {
      const out = await callAction(() => auth.forgotPasswordAction(null, form({ email: addr })), null, ip());
      expect(out.status).toBe(200);
    }
    await laterSettled(); // the tokens and e-mails are made after the answer
    const n = await db()("password_resets").whereIn("user_id", db()("users").where({ email: addr }).select("id")).count<{ n: string }[]>("* as n").first();
    expect(Number(n!.n)).toBe(RESET_ACCOUNT_LIMIT.points);
  });

  it("answers one address asking too often with a clear 429", async () => {
    const from = ip();
    let last = null as Awaited<ReturnType<typeof callAction>> | null;
    for (let i = 0; i <= RESET_ADDRESS_LIMIT.points; i++) last = await callAction(() => auth.forgotPasswordAction(null, form({ email: email("nobody") })), null, from);
    expect(last!.status).toBe(429);
    expect(last!.body.error).toMatch(/Too many password reset requests/);
  });
});

describe("bad input on the account forms", () => {
  it("sign-up names every wrong field; nothing is created", async () => {
    const out = await callAction(() => auth.signUpAction(null, form({ name: "n".repeat(121), email: "user@@example", password: "short", firm: "" })), null);
    expect(out.status).toBe(400);
    expect(out.body.issues).toEqual([
      { path: "name", message: "Name must be at most 120 characters." },
      { path: "email", message: "E-mail address does not look right (expected something like name@example.com)." },
      { path: "password", message: "Password must be at least 10 characters." },
      { path: "firm", message: "Firm name must be at least 2 characters." },
    ]);
  });

  it("sign-in with a malformed e-mail or a huge password is a 400, not a 500", async () => {
    const a = await callAction(() => auth.signInAction(null, form({ email: "nope", password: "x" })), null, ip());
    expect(a.status).toBe(400);
    expect(a.body.issues[0].path).toBe("email");
    const b = await callAction(() => auth.signInAction(null, form({ email: "owner@fernbank.example", password: "p".repeat(5000) })), null, ip());
    expect(b.status).toBe(400);
    expect(b.body.issues[0]).toEqual({ path: "password", message: "Password must be at most 200 characters." });
  });
});
