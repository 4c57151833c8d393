import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { ACCOUNT_LIMIT } from "@/lib/auth/rate-limit";

// Two `next start` processes on the already-built .next (scripts/test.sh builds first),
// one database: a session made on one is honoured by the other, signing out on one ends it
// on both, and sign-in failures count across both (rate-limit counters live in PostgreSQL).

const root = process.cwd();
const ports = [Number(process.env.TWO_PORT_A ?? 3201), Number(process.env.TWO_PORT_B ?? 3202)] as const;
const servers: ChildProcess[] = [];
const url = (i: 0 | 1, p: string) => `http://127.0.0.1:${ports[i]}${p}`;

async function waitUp(port: number, child: ChildProcess, log: () => string) {
  const until = Date.now() + 45_000;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`next start on ${port} exited: ${log()}`);
    try { if ((await fetch(`http://127.0.0.1:${port}/sign-in`)).ok) return; } catch { /* not yet */ }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`next start on ${port} did not answer within 45 s: ${log()}`);
}

beforeAll(async () => {
  expect(process.env.DATABASE_URL ?? "").toMatch(/_test$/);
  if (!fs.existsSync(path.join(root, ".next/BUILD_ID"))) throw new Error("No production build in .next: run `npx next build` (npm test does it first).");
  await Promise.all(ports.map((port) => {
    let out = "";
    const child = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-p", String(port), "-H", "127.0.0.1"], {
      cwd: root, env: { ...process.env, PORT: String(port), NEXT_TELEMETRY_DISABLED: "1" }, stdio: ["ignore", "pipe", "pipe"], detached: true,
    });
    child.stdout!.on("data", (d) => { out += d; });
    child.stderr!.on("data", (d) => { out += d; });
    servers.push(child);
    return waitUp(port, child, () => out.slice(-2000));
  }));
}, 90_000);

afterAll(async () => {
  // each server was started in its own process group: stop the group (next start forks)
  for (const s of servers) if (s.pid && s.exitCode === null) { try { process.kill(-s.pid, "SIGTERM"); } catch { /* gone */ } }
  await db()("users").where("email", "like", "two-%@example.test").delete();
  await db().destroy();
  await pgPool().end();
});

async function signIn(i: 0 | 1, email: string, password: string) {
  return fetch(url(i, "/api/v1/session"), { method: "POST", headers: { "content-type": "application/json", "x-forwarded-for": `10.77.${i}.1` }, body: JSON.stringify({ email, password }) });
}

describe("two app instances, one database", () => {
  it("a session cookie from instance A works on instance B; signing out on B ends it on A", async () => {
    const res = await signIn(0, "designer@fernbank.example", "copper-loop-designer");
    expect(res.status).toBe(200);
    const setCookie = res.headers.getSetCookie().find((c) => c.startsWith("lw_session="))!;
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    const cookie = setCookie.split(";")[0]!;

    const onB = await fetch(url(1, "/api/v1/projects"), { headers: { cookie } });
    expect(onB.status).toBe(200);
    expect(((await onB.json()) as { projects: unknown[] }).projects.length).toBeGreaterThan(0);
    const page = await fetch(url(1, "/projects"), { headers: { cookie }, redirect: "manual" });
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Imogen Pryce");

    expect((await fetch(url(1, "/api/v1/session"), { method: "DELETE", headers: { cookie, origin: url(1, "") } })).status).toBe(204);
    const onA = await fetch(url(0, "/api/v1/session"), { headers: { cookie } });
    expect(onA.status).toBe(401);
    const signedOutPage = await fetch(url(0, "/projects"), { headers: { cookie }, redirect: "manual" });
    expect([303, 307]).toContain(signedOutPage.status);
    expect(signedOutPage.headers.get("location")).toMatch(/\/sign-in\?next=%2Fprojects/);
  });

  it("failed sign-ins on both instances count toward one account limit", async () => {
    // a throw-away account so the demo people are never locked
    const email = `two-${randomUUID().slice(0, 8)}@example.test`;
    const { hashPassword } = await import("@/lib/auth/password");
    await db()("users").insert({ id: `u_two_${randomUUID().slice(0, 8)}`, email, name: "Two Servers", password_hash: await hashPassword("the-right-password") });
    for (let i = 0; i < ACCOUNT_LIMIT.points; i++) expect((await signIn((i % 2) as 0 | 1, email, "wrong")).status).toBe(400);
    for (const i of [0, 1] as const) {
      const locked = await signIn(i, email, "the-right-password");
      expect(locked.status).toBe(429);
      expect(((await locked.json()) as { error: string }).error).toMatch(/Too many failed sign-ins/);
      expect(locked.headers.get("retry-after")).toMatch(/^\d+$/);
    }
  });
});
