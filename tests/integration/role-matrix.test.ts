import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { rows } from "./route-table";
import { cookieFor, everyone, type Who } from "./helpers/call";
import { dropFixtures, makeFixture, snapshot } from "./helpers/fixture";

// Every API route and server action × every role and signed out, against the real
// PostgreSQL (DATABASE_URL → loopwright_test, demo seed). Each cell gets a fresh fixture
// project; a denial must answer 401/403/404 (bad input 400) with a message and change nothing.

const cookies = {} as Record<Who, string | null>;

beforeAll(async () => {
  expect(process.env.DATABASE_URL ?? "", "run through npm test (DATABASE_URL must be the test database)").toMatch(/_test$/);
  for (const who of everyone) cookies[who] = await cookieFor(who);
});

afterAll(async () => {
  await (await import("@/lib/live/listener")).liveListener().close();
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

describe.each(rows)("$name", (row) => {
  if (row.todo || !row.call || !row.expect) {
    it.todo(`TODO: ${row.todo ?? "no call"}`);
    return;
  }
  for (const who of everyone) {
    const want = row.expect[who];
    it(`${who} → ${want}`, async () => {
      const f = await makeFixture(row.fixture);
      const prepared = row.prepare ? await row.prepare(f) : undefined;
      const before = await snapshot(f);
      const out = await row.call!(f, cookies[who], who, prepared);
      expect(out.status, JSON.stringify(out.body)).toBe(want);
      if (want >= 400) {
        // a denial (401/403/404) or refused input (400/409): a message, and nothing changed
        const error = out.body?.error;
        expect(typeof error === "string" && error.length > 10, `a refusal needs a message, got ${JSON.stringify(out.body)}`).toBe(true);
        expect(await snapshot(f)).toBe(before);
      }
    });
  }
});
