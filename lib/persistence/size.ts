import "server-only";
import { calculate } from "@/lib/hydraulics/calculate";
import type { Issue, Results } from "@/lib/schematic";

/**
 * The one seam between the app (sizing action, calculate API) and the engine.
 * The engine parses and validates the document itself (parseSchematic), so a
 * bad document comes back as JSON-path issues, never as an exception.
 */
export function size(input: unknown): { ok: true; results: Results } | { ok: false; issues: Issue[] } {
  const answer = calculate(input);
  return answer.ok ? { ok: true, results: answer.results } : { ok: false, issues: answer.issues };
}
