/**
 * POST /api/v1/optimise and `npm run optimise`: the same answer shape
 * {sizes, cost, before, after, feasible, findings}, refusals naming the field.
 * The route handler is called directly with real Requests on the seeded test
 * database (the role matrix checks who may call it).
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { POST } from "@/app/api/v1/optimise/route";
import { lucia } from "@/lib/auth/lucia";
import { pipeCatalogue } from "@/lib/hydraulics/pipes/catalogue";

const hall = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/millbrook-hall.json"), "utf8"));
let cookie = "";
beforeAll(async () => {
  cookie = `lw_session=${(await lucia().createSession("demo-designer", {})).id}`;
});

const post = (body: string, withCookie = true) =>
  POST(new Request("http://test/api/v1/optimise", { method: "POST", body, headers: withCookie ? { cookie, origin: "http://test", "content-type": "application/json" } : { "content-type": "application/json" } }), undefined as never);

describe("POST /api/v1/optimise", () => {
  it("answers the contract's shape for the demo hall: a size for every pipe, cost before and after", async () => {
    const res = await post(JSON.stringify({ doc: hall, options: { objective: "pipe-cost" } }));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(Object.keys(body)).toEqual(expect.arrayContaining(["sizes", "cost", "before", "after", "feasible", "findings"]));
    expect(Object.keys(body.sizes).sort()).toEqual(hall.pipes.map((p: { id: string }) => p.id).sort());
    expect(body.feasible).toBe(true);
    // every size from the pipe's own material catalogue
    for (const p of hall.pipes) expect(pipeCatalogue[p.material as "copper"].map((r) => r.size)).toContain(body.sizes[p.id]);
    // cost = Σ price × length at those sizes, with the default (demo) prices the answer names
    expect(body.priceSource).toMatchObject({ copper: "default-demo" });
    expect(body.cost).toBe(body.after.cost);
    expect(body.cost).toBeLessThanOrEqual(body.before.cost);
    for (const k of ["before", "after"]) expect(typeof body[k].requiredHeadKpa).toBe("number");
  });

  it("keeps locked pipes and answers 400 naming options.* and doc.* paths", async () => {
    const locked = hall.pipes.filter((p: { id: string }) => p.id.startsWith("z1-")).map((p: { id: string }) => p.id);
    const ok = await (await post(JSON.stringify({ doc: hall, options: { locked } }))).json();
    for (const id of locked) expect(ok.sizes[id]).toBe(hall.pipes.find((p: { id: string }) => p.id === id).size);

    const badOptions = await post(JSON.stringify({ doc: hall, options: { objective: "cheapest", locked: ["no-such-pipe"], prices: { copper: { "99": 3 } } } }));
    expect(badOptions.status).toBe(400);
    const paths = (await badOptions.json()).issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["options.objective", "options.prices.copper.99"]));

    const unknownPipe = await post(JSON.stringify({ doc: hall, options: { locked: ["no-such-pipe"] } }));
    expect((await unknownPipe.json()).issues[0].path).toBe("options.locked[0]");

    const badDoc = await post(JSON.stringify({ doc: { ...hall, parts: [{ ...hall.parts[0], type: "kettle" }, ...hall.parts.slice(1)] } }));
    expect(badDoc.status).toBe(400);
    expect((await badDoc.json()).issues[0].path).toBe("doc.parts[0].type");

    expect((await post(JSON.stringify({ options: {} }))).status).toBe(400);
    expect((await post("{not json")).status).toBe(400);
  });

  it("answers 413 above 2 MB and 401 when signed out", async () => {
    expect((await post(JSON.stringify({ doc: { pad: "x".repeat(2 * 1024 * 1024 + 10) } }))).status).toBe(413);
    expect((await post(JSON.stringify({ doc: hall }), false)).status).toBe(401);
  });
});

describe("npm run optimise", () => {
  const root = process.cwd();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "optimise-"));
  const write = (name: string, value: unknown) => {
    const f = path.join(dir, name);
    fs.writeFileSync(f, typeof value === "string" ? value : JSON.stringify(value));
    return f;
  };
  const run = (...args: string[]) => spawnSync(path.join(root, "node_modules/.bin/tsx"), ["scripts/optimise.ts", ...args], { cwd: root, encoding: "utf8" });

  it("prints the same answer as the API for a file and an options file", () => {
    const r = run(write("hall.json", hall), write("options.json", { objective: "life-cost", headMarginKpa: 5 }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.feasible).toBe(true);
    expect(out.objective).toBe("life-cost");
    expect(out.headMarginKpa).toBe(5);
    expect(typeof out.after.lifeCost).toBe("number");
    expect(Object.keys(out.sizes)).toHaveLength(hall.pipes.length);
  }, 90_000);

  it("exits 2 naming the field for bad options, bad JSON and a missing file", () => {
    const bad = run(write("hall2.json", hall), write("bad-options.json", { headMarginKpa: -3 }));
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("options.headMarginKpa");
    expect(run(write("broken.json", "{ nope")).stderr).toMatch(/not valid JSON/);
    expect(run(path.join(dir, "missing.json")).status).toBe(2);
  }, 120_000);
});
