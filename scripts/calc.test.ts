import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

const root = path.resolve(__dirname, "..");
const tsx = path.join(root, "node_modules/.bin/tsx");
const run = (file: string) => spawnSync(tsx, ["scripts/calc.ts", file], { cwd: root, encoding: "utf8" });
const dir = mkdtempSync(path.join(tmpdir(), "calc-"));
const write = (name: string, text: string) => {
  const f = path.join(dir, name);
  writeFileSync(f, text);
  return f;
};

describe("npm run calc", () => {
  it("prints results and exits 0 for a valid schematic (with findings)", () => {
    const r = run(write("ok.json", JSON.stringify(smallSystem())));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.engine).toBe("1.4.0");
    expect(out.findings.length).toBeGreaterThan(0);
  });

  it("exits 2 naming each JSON path of an invalid schematic", () => {
    const doc = smallSystem();
    (doc.pipes[0] as Record<string, unknown>).lengthM = "long";
    doc.parts[0]!.type = "kettle";
    const r = run(write("bad.json", JSON.stringify(doc)));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("parts[0].type");
    expect(r.stderr).toContain("pipes[0].lengthM");
    expect(r.stdout).toBe("");
  });

  it("exits 2 for bad JSON and for a missing file", () => {
    const bad = run(write("broken.json", "{ not json"));
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/not valid JSON/);
    const missing = run(path.join(dir, "nope.json"));
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/cannot read/);
  });
});

