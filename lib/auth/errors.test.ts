import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { apiHandler, AuthError, runAction } from "./authorize";
import { UserError } from "./errors";
import { withRequestCookies, readCookie, writeCookie, RequestScope } from "./request-context";

// The one error mapping for route handlers and server actions.
const call = (fn: () => Promise<Response>) => apiHandler(async () => fn())(new Request("http://x.test/api"), {});

describe("apiHandler", () => {
  it("maps AuthError to its status with the message", async () => {
    for (const status of [401, 403, 404] as const) {
      const res = await call(async () => { throw new AuthError(status, `needs something (${status})`); });
      expect(res.status).toBe(status);
      expect(await res.json()).toEqual({ error: `needs something (${status})` });
    }
  });

  it("maps ZodError to 400 with field paths", async () => {
    const res = await call(async () => { z.object({ email: z.email({ error: "E-mail address does not look right." }) }).parse({ email: "nope" }); return new Response(); });
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({ error: "email: E-mail address does not look right.", issues: [{ path: "email", message: "E-mail address does not look right." }] });
  });

  it("answers 500 without leaking the real error, and logs it", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const res = await call(async () => { throw new Error("password for db is hunter2"); });
    expect(res.status).toBe(500);
    expect(JSON.stringify(await res.json())).not.toContain("hunter2");
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });

  it("passes UserError status and headers through", async () => {
    const res = await call(async () => { throw new UserError(429, "Too many tries.", { "retry-after": "60" }); });
    expect(res.status).toBe(429);
    expect(res.headers.get("retry-after")).toBe("60");
  });

  it("rethrows Next's redirect so Next can handle it", async () => {
    const redirect = Object.assign(new Error("NEXT_REDIRECT"), { digest: "NEXT_REDIRECT;replace;/x;307;" });
    await expect(call(async () => { throw redirect; })).rejects.toBe(redirect);
  });

  it("reads cookies from the Request and copies set cookies onto the Response", async () => {
    const h = apiHandler(async () => {
      await writeCookie("b", "2", { httpOnly: true, sameSite: "lax" });
      return Response.json({ a: await readCookie("a") });
    });
    const res = await h(new Request("http://x.test", { headers: { cookie: "a=1" } }), {});
    expect(await res.json()).toEqual({ a: "1" });
    expect(res.headers.getSetCookie()).toEqual(["b=2; Path=/; HttpOnly; SameSite=Lax"]);
  });
});

describe("runAction and withRequestCookies", () => {
  it("wraps results and errors the same way", async () => {
    expect(await runAction(async () => 5)).toEqual({ ok: true, data: 5 });
    expect(await runAction(async () => { throw new AuthError(403, "Only a project owner can do that."); }))
      .toEqual({ ok: false, status: 403, error: "Only a project owner can do that." });
  });

  it("gives server actions a cookie jar outside Next", async () => {
    expect(await withRequestCookies("lw_session=abc", () => readCookie("lw_session"))).toBe("abc");
    const scope = new RequestScope({ cookie: null });
    await scope.run(() => writeCookie("x", "y", {}));
    expect(scope.setCookies).toEqual(["x=y; Path=/"]);
  });
});
