import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics";

const root = path.resolve(__dirname, "..");
const tsx = path.join(root, "node_modules/.bin/tsx");
const data = (f: string) => path.join(root, "db/seeds/data", f);
const run = (...args: string[]) => spawnSync(tsx, ["scripts/draft.ts", ...args], { cwd: root, encoding: "utf8" });
const dir = mkdtempSync(path.join(tmpdir(), "draft-"));
const write = (name: string, text: string) => {
  const f = path.join(dir, name);
  writeFileSync(f, text);
  return f;
};

// Each case spawns tsx (a second or more on a busy machine): generous timeouts.
describe("npm run draft -- ROOMS.json PLANT.json", () => {
  it("prints a schematic the engine sizes with no error findings, its notes on stderr, exit 0", () => {
    const r = run(data("orchard-end-rooms.json"), data("orchard-end-plant.json"), "--emitters", data("fernbank-emitters.csv"));
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.format).toBe("loopwright/schematic");
    const sized = calculate(doc);
    if (!sized.ok) throw new Error(sized.issues.map((i) => i.message).join("; "));
    expect(sized.results.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(sized.results.emitters.every((e) => e.ok)).toBe(true);
    expect(r.stderr).toMatch(/^info draft\.emitter-upsized: Lounge/m);
  });

  it("exits 2 naming the JSON path of a bad plant", () => {
    const bad = run(data("orchard-end-rooms.json"), write("plant.json", JSON.stringify({ heatSource: { kind: "heat-pump", ratedOutputKw: 7 }, flowTemperatureC: 45, deltaTK: 5, zones: [{ name: "Z", rooms: ["Loft"] }] })));
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("plant.zones[0].rooms[0]: no room named 'Loft'");
    expect(bad.stdout).toBe("");
  });
  it("exits 2 for a file that is not JSON or cannot be read", () => {
    const notJson = run(write("x.json", "{ nope"), data("orchard-end-plant.json"));
    expect([notJson.status, notJson.stderr]).toEqual([2, expect.stringMatching(/x\.json: not valid JSON/)]);
    expect(run("/nonexistent.json", data("orchard-end-plant.json")).stderr).toMatch(/nonexistent\.json: cannot read the file \(ENOENT\)/);
  });
  it("exits 2 with the usage line when a file is missing from the command", () => {
    const r = run(data("orchard-end-rooms.json"));
    expect([r.status, r.stderr]).toEqual([2, expect.stringMatching(/usage: npm run --silent draft/)]);
  });
}, 90_000);
