/**
 * The optimiser's one entry for the API and the CLI: `{doc, options}` parsed
 * (the schematic by the engine's own parser, the options by their schema),
 * every issue named by its path under `doc.` or `options.`, then optimised.
 */
import { parseSchematic, type Issue } from "@/lib/schematic/parse";
import { zodIssues } from "@/lib/schematic/parse";
import { optimiseOptionsSchema } from "./options";
import { optimiseSchematic, type OptimiseResult } from "./optimise";

export type OptimiseAnswer = { ok: true; result: OptimiseResult } | { ok: false; issues: Issue[] };

const under = (prefix: string, issues: Issue[]): Issue[] =>
  issues.map((i) => {
    const path = i.path ? `${prefix}.${i.path}` : prefix;
    const message = i.path && i.message.startsWith(i.path) ? `${prefix}.${i.message}` : `${path}: ${i.message.replace(/^document: /, "")}`;
    return { path, message };
  });

export function optimise(doc: unknown, options: unknown = {}): OptimiseAnswer {
  const parsed = parseSchematic(doc);
  const opts = optimiseOptionsSchema.safeParse(options ?? {});
  const issues: Issue[] = [];
  if (!parsed.ok) issues.push(...under("doc", parsed.issues));
  if (!opts.success) issues.push(...under("options", zodIssues(opts.error)));
  if (!parsed.ok || !opts.success) return { ok: false, issues };
  const ids = new Set(parsed.doc.pipes.map((p) => p.id));
  opts.data.locked.forEach((id, i) => {
    if (!ids.has(id)) issues.push({ path: `options.locked[${i}]`, message: `options.locked[${i}]: no pipe '${id}' in the schematic` });
  });
  if (issues.length > 0) return { ok: false, issues };
  try {
    return { ok: true, result: optimiseSchematic(parsed.doc, opts.data) };
  } catch (e) {
    // as calculate(): an engine fault is reported, not thrown
    return { ok: false, issues: [{ path: "", message: `internal engine error: ${(e as Error).message}` }] };
  }
}
