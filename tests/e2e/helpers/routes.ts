import fs from "node:fs";
import path from "node:path";

// Every page and route handler of the production build, from Next's own manifest, as a URL to
// request (dynamic segments filled with `params`, unknown ones with "x"), so a page added
// later is covered by the header test without anyone listing it.
export function builtRoutes(params: Record<string, string>): { url: string; kind: "page" | "route" }[] {
  const manifest = JSON.parse(fs.readFileSync(path.join(process.cwd(), ".next/server/app-paths-manifest.json"), "utf8")) as Record<string, string>;
  return Object.keys(manifest)
    .filter((k) => !/\/_(global-error|not-found)\//.test(k))
    .map((k) => {
      const kind = k.endsWith("/route") ? "route" as const : "page" as const;
      const url = k.replace(/\/(page|route)$/, "").replace(/\/\([^)]+\)/g, "").replace(/\[([^\]]+)\]/g, (_m, p: string) => params[p] ?? "x") || "/";
      return { url, kind };
    });
}

/** A server action's id from the build's manifest, by its exported name and file. */
export function actionId(name: string, file: string): string {
  const m = JSON.parse(fs.readFileSync(path.join(process.cwd(), ".next/server/server-reference-manifest.json"), "utf8")) as
    { node: Record<string, { exportedName?: string; filename?: string }> };
  const hit = Object.entries(m.node).find(([, v]) => v.exportedName === name && v.filename === file);
  if (!hit) throw new Error(`no server action ${name} in ${file} in the build`);
  return hit[0];
}
