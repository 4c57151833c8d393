import "server-only";
import { getRevision, type RevisionRecord } from "@/db/queries/schematics";
import { draftResultRow, putDraftResults, putRevisionResults, revisionResultRows, type KeptResults } from "@/db/queries/kept-results";
import { ENGINE_VERSION } from "@/lib/hydraulics/calculate";
import { Answer, sizeToAnswer } from "@/lib/persistence/size";
import { parseSchematic, type Results, type Schematic } from "@/lib/schematic";
import { resultsChanges, type ResultChange } from "@/lib/schematic/results-changes";

// Results are part of a revision: read one with its numbers, sizing it (and keeping the
// answer) when none are stored for this engine version. The one place review, compare,
// report and the board read a revision's results from.

/** Kept results were computed by an older engine: sized again now, and what differs. */
export type Recomputed = { fromEngine: string; computedAt: string; changes: ResultChange[] } | null;

export interface RevisionWithResults {
  revision: RevisionRecord & { projectId: string };
  /** The revision's document, migrated to the current contract version. */
  document: Schematic;
  /** null only if the engine could not size it (the stored document is not valid). */
  results: Results | null;
  engineVersion: string | null;
  recomputed: Recomputed;
}

/** Size a document with this engine (through the results cache). */
export function sizeDocument(doc: Schematic): { json: string; results: Results } | null {
  const text = JSON.stringify(doc);
  const r = sizeToAnswer(text, () => ({ ok: true, value: doc }));
  if (!(r instanceof Answer)) return null;
  return { json: new TextDecoder().decode(r.json), results: r.results() };
}

/** The newest older-engine answer beside the current one, with the differences. */
function againstOlder(rows: KeptResults[], current: Results): Recomputed {
  const older = rows.find((r) => r.engineVersion !== ENGINE_VERSION);
  return older ? { fromEngine: older.engineVersion, computedAt: older.computedAt, changes: resultsChanges(older.results, current) } : null;
}

export async function revisionWithResults(revisionId: string): Promise<RevisionWithResults | null> {
  const row = await getRevision(revisionId);
  if (!row) return null;
  const parsed = parseSchematic(row.document);
  const { document: _raw, ...revision } = row;
  if (!parsed.ok) return null;
  const rows = await revisionResultRows(revisionId);
  const kept = rows.find((r) => r.engineVersion === ENGINE_VERSION);
  let results = (kept?.results ?? null) as Results | null;
  if (!results) {
    const sized = sizeDocument(parsed.doc);
    if (sized) {
      await putRevisionResults(revisionId, ENGINE_VERSION, sized.json);
      results = sized.results;
    }
  }
  return {
    revision, document: parsed.doc, results, engineVersion: results ? ENGINE_VERSION : null,
    recomputed: results ? againstOlder(rows, results) : null,
  };
}

export interface DraftSizing {
  /** The document as it was when sized (the board compares it with the draft now). */
  document: Schematic;
  results: Results;
  engineVersion: string;
  sizedAt: string;
  sizedBy: string | null;
  recomputed: Recomputed;
}

/**
 * The draft's last sizing. When an older engine made it, the same document is sized again
 * now and the differences come along (flagged until the draft is sized again).
 */
export async function draftSizing(schematicId: string): Promise<DraftSizing | null> {
  const row = await draftResultRow(schematicId);
  if (!row) return null;
  const parsed = parseSchematic(row.document);
  if (!parsed.ok) return null;
  const base = { document: parsed.doc, sizedAt: row.computedAt, sizedBy: row.sizedBy };
  if (row.engineVersion === ENGINE_VERSION) return { ...base, results: row.results as Results, engineVersion: row.engineVersion, recomputed: null };
  const sized = sizeDocument(parsed.doc);
  if (!sized) return null;
  return { ...base, results: sized.results, engineVersion: ENGINE_VERSION,
    recomputed: { fromEngine: row.engineVersion, computedAt: row.computedAt, changes: resultsChanges(row.results, sized.results) } };
}

export async function keepDraftSizing(schematicId: string, doc: Schematic, resultsJson: string, userId: string): Promise<void> {
  await putDraftResults({ schematicId, engineVersion: ENGINE_VERSION, documentJson: JSON.stringify(doc), resultsJson, userId });
}

/** Size a revision as it is saved; its results are stored in the same transaction (db/queries saveRevision). */
export function resultsForNewRevision(doc: Schematic): { engineVersion: string; json: string; results: Results } | null {
  const sized = sizeDocument(doc);
  return sized ? { engineVersion: ENGINE_VERSION, ...sized } : null;
}
