/**
 * parseSchematic: migrate → zod → reference checks. Every issue names its JSON
 * path (`parts[3].props.kvs`) and the message starts with that path, so a CLI
 * user or a form can find the field.
 */
import type { z } from "zod";
import { IdIndex, portIndex } from "./id-index";
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
  const partIds = doc.parts.map((part) => part.id);
  // Open-addressing id tables (id-index.ts): a pipe end's part is found from the reference's
  // prefix in place, with no substring cut and hashed per end. Paths are formatted only for
  // an issue: a valid 20,000-pipe document would otherwise build 60,000 path strings here for nothing.
  const parts = new IdIndex(partIds);
  const repeats = new IdIndex([...partIds, ...doc.pipes.map((pipe) => pipe.id)]).repeats;
  const dup = (list: "parts" | "pipes", i: number, id: string) => {
    if (!repeats[list === "parts" ? i : partIds.length + i]) return;
    const path = `${list}[${i}].id`;
    issues.push({ path, message: `${path}: id '${id}' is used more than once` });
  };
  doc.parts.forEach((part, i) => dup("parts", i, part.id));
  // one call per end rather than a loop over ["from", "to"]: no array and no keyed read per pipe
  const checkEnd = (i: number, pipeId: string, end: "from" | "to", ref: string) => {
    // the last dot by charCodeAt (String#lastIndexOf is a runtime call, not compiled inline)
    let dot = ref.length - 1;
    while (dot >= 0 && ref.charCodeAt(dot) !== 46) dot--;
    // the part id is ref.slice(0, dot), as splitPortRef cuts it (no dot: all but the last character)
    const found = parts.prefixOf(ref, dot >= 0 ? dot : Math.max(0, ref.length - 1));
    const part = found >= 0 ? doc.parts[found]! : undefined;
    if (part && portIndex(sharedPortsOf(part), ref, dot + 1) >= 0) return; // the common case: nothing to report
    const path = `pipes[${i}].${end}`;
    const { partId, port } = splitPortRef(ref);
    if (!part) {
      issues.push({ path, message: `${path}: pipe '${pipeId}' names part '${partId}', which does not exist` });
      return;
    }
    const ports = sharedPortsOf(part);
    if (!ports.includes(port)) {
      issues.push({
        path,
        message: `${path}: '${port}' is not a port of ${part.type} '${partId}' (ports: ${ports.join(", ")})`,
      });
    }
  };
  doc.pipes.forEach((pipe, i) => {
    dup("pipes", i, pipe.id);
    checkEnd(i, pipe.id, "from", pipe.from);
    checkEnd(i, pipe.id, "to", pipe.to);
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
