/**
 * parseSchematic: migrate → zod → reference checks. Every issue names its JSON
 * path (`parts[3].props.kvs`) and the message starts with that path, so a CLI
 * user or a form can find the field.
 */
import type { z } from "zod";
import { migrate } from "./migrate";
import { sharedPortsOf, splitPortRef } from "./parts";
import { schematicSchema, type Schematic } from "./schema";

export interface Issue {
  path: string;
  message: string;
}
export type ParseResult = { ok: true; doc: Schematic } | { ok: false; issues: Issue[] };

/** ["parts", 3, "props", "kvs"] → "parts[3].props.kvs" */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out;
}

function issueText(issue: z.core.$ZodIssue): string {
  if (issue.code === "invalid_union" && "discriminator" in issue && issue.discriminator) {
    const options = (issue as { options?: unknown[] }).options ?? [];
    return `unknown ${String(issue.discriminator)}; expected one of ${options.join(", ")}`;
  }
  return issue.message;
}

export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((issue) => {
    const path = formatPath(issue.path);
    return { path, message: `${path || "document"}: ${issueText(issue)}` };
  });
}

/** Ids unique across parts and pipes; pipe ends name an existing part and one of its ports. */
function referenceIssues(doc: Schematic): Issue[] {
  const issues: Issue[] = [];
  const parts = new Map<string, Schematic["parts"][number]>();
  const seen = new Set<string>();
  // Paths are formatted only for an issue: a valid 20,000-pipe document would
  // otherwise build 60,000 path strings here for nothing.
  const dup = (list: "parts" | "pipes", i: number, id: string) => {
    if (seen.has(id)) {
      const path = `${list}[${i}].id`;
      issues.push({ path, message: `${path}: id '${id}' is used more than once` });
    }
    seen.add(id);
  };
  doc.parts.forEach((part, i) => {
    dup("parts", i, part.id);
    parts.set(part.id, part);
  });
  doc.pipes.forEach((pipe, i) => {
    dup("pipes", i, pipe.id);
    for (const end of ["from", "to"] as const) {
      const ref = pipe[end];
      const dot = ref.lastIndexOf(".");
      const part = parts.get(ref.slice(0, dot));
      if (part && sharedPortsOf(part).includes(ref.slice(dot + 1))) continue; // the common case: nothing to report
      const path = `pipes[${i}].${end}`;
      const { partId, port } = splitPortRef(ref);
      if (!part) {
        issues.push({ path, message: `${path}: pipe '${pipe.id}' names part '${partId}', which does not exist` });
        continue;
      }
      const ports = sharedPortsOf(part);
      if (!ports.includes(port)) {
        issues.push({
          path,
          message: `${path}: '${port}' is not a port of ${part.type} '${partId}' (ports: ${ports.join(", ")})`,
        });
      }
    }
    if (pipe.from === pipe.to) {
      issues.push({ path: `pipes[${i}].to`, message: `pipes[${i}].to: pipe '${pipe.id}' joins a port to itself` });
    }
  });
  return issues;
}

export function parseSchematic(input: unknown): ParseResult {
  const migrated = migrate(input);
  if (!migrated.ok) return migrated;
  const parsed = schematicSchema.safeParse(migrated.doc);
  if (!parsed.success) return { ok: false, issues: zodIssues(parsed.error) };
  const issues = referenceIssues(parsed.data);
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, doc: parsed.data };
}
