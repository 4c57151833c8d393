import "server-only";
import { z } from "zod";
import { requireProjectRole } from "@/lib/auth/authorize";
import type { Schematic } from "@/lib/schematic";
import { docDiff, type DocDiff } from "@/lib/schematic/doc-diff";
import { designMetrics, type Metrics } from "./metrics";
import { checkReadable, loadDesign } from "./read-ref";
import { refSchema, refText } from "./refs";
import { sharedScenarios, type SharedScenario } from "./scenarios";

// Side by side: two designs (drafts or revisions), what changed from a to b by id, and the
// engine's numbers for each exactly as sizing it alone gives. The one function behind
// GET /api/v1/compare and the compare page.

export interface CompareSide { ref: string; name: string; metrics: Metrics }

export interface Comparison {
  a: CompareSide;
  b: CompareSide;
  /** From a to b, by part and pipe id (lib/schematic/doc-diff.ts), in the terms sizing sees. */
  changes: DocDiff;
  scenarios: SharedScenario[];
}

/** The answer, and the two documents the page draws. */
export interface ComparisonView { comparison: Comparison; documents: { a: Schematic; b: Schematic }; projectIds: { a: string; b: string } }

const input = z.object({ a: refSchema, b: refSchema });

/**
 * `a` and `b` as given (query parameters): 400 naming the field when one does not parse,
 * 404 when one is missing or cannot be read by the caller, 403 when the caller's role on
 * its project may not compare. A design compared with itself shows no changes.
 */
export async function compareDesigns(given: { a: unknown; b: unknown }): Promise<ComparisonView> {
  const refs = input.parse(given);
  // one after the other: the refusal names a when both are refused
  const readable = [await checkReadable(refs.a, "a"), await checkReadable(refs.b, "b")] as const;
  for (const projectId of new Set(readable.map((r) => r.projectId))) await requireProjectRole(projectId, "variant.compare");
  const [a, b] = await Promise.all([loadDesign(readable[0], "a", { results: true }), loadDesign(readable[1], "b", { results: true })]);
  const side = (d: typeof a): CompareSide => ({ ref: refText(d.ref), name: d.name, metrics: designMetrics(d.document, d.results) });
  return {
    comparison: { a: side(a), b: side(b), changes: docDiff(a.document, b.document), scenarios: sharedScenarios(a.results, b.results) },
    documents: { a: a.document, b: b.document },
    projectIds: { a: a.projectId, b: b.projectId },
  };
}
