import "server-only";
import { AuthError, requireSchematicAccess } from "@/lib/auth/authorize";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { UserError } from "@/lib/auth/errors";
import { getRevision, getSchematic } from "@/db/queries/schematics";
import { draftSizing, revisionWithResults, sizeDocument } from "@/lib/revisions/with-results";
import { parseSchematic, type Results, type Schematic } from "@/lib/schematic";
import { docChanges } from "@/lib/schematic/doc-changes";
import { refText, type Ref } from "./refs";
import type { ProjectRole } from "@/lib/auth/policy";

// A design named by a ref, read as the caller may read it: the schematic's read rule
// (lib/auth), installers only issued revisions. Whatever the caller may not read answers
// 404 like a ref that does not exist, so refs cannot be probed.

export interface Readable { ref: Ref; projectId: string; schematicId: string; role: ProjectRole }

export interface Design extends Readable {
  /** "Bypass only — working draft", "Bypass only — Rev 2 (in review)". */
  name: string;
  document: Schematic;
  /** The engine's answer for this document; null only when it cannot be sized. */
  results: Results | null;
}

const unreadable = (field: string, ref: Ref) =>
  new AuthError(404, `${field}: ${refText(ref)} was not found, or you cannot read it.`);

/** May the caller read it? 404 when not (or when it does not exist); 401 when signed out. */
export async function checkReadable(ref: Ref, field: string): Promise<Readable> {
  try {
    if (ref.kind === "revision") {
      const a = await requireRevisionAccess(ref.id);
      return { ref, projectId: a.schematic.projectId, schematicId: a.schematic.id, role: a.role };
    }
    const a = await requireSchematicAccess(ref.id, "read");
    if (a.issuedOnly) throw unreadable(field, ref); // installers read issued revisions, never the draft
    return { ref, projectId: a.schematic.projectId, schematicId: a.schematic.id, role: a.role };
  } catch (e) {
    if (e instanceof AuthError && e.status !== 401) throw unreadable(field, ref);
    throw e;
  }
}

function parsed(doc: unknown, field: string, ref: Ref): Schematic {
  const p = parseSchematic(doc);
  if (!p.ok) throw new UserError(409, `${field}: the stored document of ${refText(ref)} is not a valid schematic (${p.issues[0]?.message ?? "unreadable"}).`);
  return p.doc;
}

/**
 * The working draft with the results sizing it gives: the draft's kept sizing when it was
 * made for this very document (as far as sizing sees it), else sized now (results cache).
 */
async function draftDesign(r: Readable, field: string, withResults: boolean): Promise<Design> {
  const s = await getSchematic(r.schematicId);
  if (!s) throw unreadable(field, r.ref);
  const document = parsed(s.draft, field, r.ref);
  let results: Results | null = null;
  if (withResults) {
    const kept = await draftSizing(r.schematicId);
    results = kept && docChanges(kept.document, document).length === 0 ? kept.results : sizeDocument(document)?.results ?? null;
  }
  return { ...r, name: `${s.name} — working draft`, document, results };
}

/** A saved revision with its kept results (revisionWithResults sizes and keeps them when missing). */
async function revisionDesign(r: Readable, field: string, withResults: boolean): Promise<Design> {
  const [rev, s] = await Promise.all([withResults ? revisionWithResults(r.ref.id) : null, getSchematic(r.schematicId)]);
  const row = rev ? null : await getRevision(r.ref.id);
  const head = rev?.revision ?? row;
  if (!head || !s) throw unreadable(field, r.ref);
  const document = rev ? rev.document : parsed(row!.document, field, r.ref);
  return { ...r, name: `${s.name} — Rev ${head.number} (${head.status})`, document, results: rev?.results ?? null };
}

/** The design a readable ref names, with its results when asked. */
export function loadDesign(r: Readable, field: string, o: { results: boolean }): Promise<Design> {
  return r.ref.kind === "revision" ? revisionDesign(r, field, o.results) : draftDesign(r, field, o.results);
}
