/**
 * Numbered migrators: documents are migrated on load (architecture.md, Data).
 * `migrators[n]` turns a version-n document into version n+1. v1 is current,
 * so the table is empty; the next format change adds `1: (doc) => …`.
 */
export const currentVersion = 1;

type Migrator = (doc: Record<string, unknown>) => Record<string, unknown>;
export const migrators: Record<number, Migrator> = {};

export type MigrateResult =
  | { ok: true; doc: unknown }
  | { ok: false; issues: { path: string; message: string }[] };

/** Bring a raw document to the current version; leaves non-objects to the schema. */
export function migrate(input: unknown): MigrateResult {
  if (typeof input !== "object" || input === null || Array.isArray(input)) return { ok: true, doc: input };
  let doc = input as Record<string, unknown>;
  const version = doc.version;
  if (typeof version !== "number" || !Number.isInteger(version)) return { ok: true, doc };
  if (version > currentVersion) {
    return {
      ok: false,
      issues: [{ path: "version", message: `version: ${version} is newer than this engine reads (${currentVersion})` }],
    };
  }
  for (let v = version; v < currentVersion; v++) {
    const step = migrators[v];
    if (!step) return { ok: false, issues: [{ path: "version", message: `version: no migrator from ${v}` }] };
    doc = step(doc);
  }
  return { ok: true, doc };
}
