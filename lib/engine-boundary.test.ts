import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// The engine runs unchanged in the CLI, route handlers, server actions, a worker and
// tests, so lib/hydraulics and lib/schematic must not import a framework or a database.
const forbidden = /from\s+["'](react|react-dom|next(\/[^"']*)?|knex|pg|zustand|@xyflow\/[^"']+|swr|server-only|@\/lib\/db|@\/db\/[^"']*)["']/;

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return sources(full);
    return /\.tsx?$/.test(e.name) && !e.name.endsWith(".test.ts") ? [full] : [];
  });
}

describe("engine boundary", () => {
  const files = ["lib/hydraulics", "lib/schematic"].flatMap((d) => (fs.existsSync(d) ? sources(d) : []));
  it("has engine sources to check", () => expect(files.length).toBeGreaterThan(5));
  it.each(files)("%s imports no framework", (file) => {
    expect(fs.readFileSync(file, "utf8")).not.toMatch(forbidden);
  });
});
