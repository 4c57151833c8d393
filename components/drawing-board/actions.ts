"use server";

import { z } from "zod";
import { requireActionOnSomeProject, requireProjectRole, requireSchematicAccess, requireUser } from "@/lib/auth/authorize";
import * as q from "@/db/queries/schematics";
import { parseSchematic } from "@/lib/schematic";
import { invalidDocument, refusal, runChecked } from "@/lib/persistence/outcome";
import { Answer, sizeToAnswer } from "@/lib/persistence/size";
import { makeVariant } from "@/lib/persistence/variants";
import { moveRevisionStatus } from "@/lib/review/status-move";
import { keepDraftSizing, resultsForNewRevision } from "@/lib/revisions/with-results";

// Server actions of the drawing board. Each: zod-check the envelope, check the role
// through lib/auth, validate the document with the engine's own parser (issues name
// JSON paths), then one call into db/queries. Errors come back as ActionResult.

const uuid = z.uuid("must be a schematic id");
const lockVersion = z.number().int().min(1);

export async function autosaveDraft(input: { schematicId: string; lockVersion: number; doc: unknown }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: uuid, lockVersion, doc: z.unknown() }).parse(input);
    const { user } = await requireSchematicAccess(i.schematicId, "edit");
    const parsed = parseSchematic(i.doc);
    if (!parsed.ok) return invalidDocument(parsed.issues);
    const r = await q.saveDraft({ schematicId: i.schematicId, lockVersion: i.lockVersion, doc: parsed.doc, userId: user.id });
    return r.ok ? r : refusal(r);
  });
}

export async function saveRevision(input: { schematicId: string; lockVersion: number; doc: unknown; message: string }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: uuid, lockVersion, doc: z.unknown(), message: z.string().trim().min(1, "say what changed").max(2000) }).parse(input);
    const access = await requireSchematicAccess(i.schematicId, "edit");
    if (access.schematic.kind === "team") await requireProjectRole(access.schematic.projectId, "revision.save");
    const parsed = parseSchematic(i.doc);
    if (!parsed.ok) return invalidDocument(parsed.issues);
    // sized before the write, so the revision and its results are stored in one transaction
    const sized = resultsForNewRevision(parsed.doc);
    const r = await q.saveRevision({ ...i, doc: parsed.doc, userId: access.user.id, results: sized });
    if (!r.ok) return refusal(r);
    // the draft is now that revision's document: its last sizing is the revision's
    if (sized) await keepDraftSizing(i.schematicId, parsed.doc, sized.json, access.user.id);
    return { ...r, results: sized?.results ?? null };
  });
}

/** The approval path (lib/review/status-move.ts; the board calls POST /api/v1/revisions/{id}/status). */
export async function setRevisionStatus(input: { revisionId: string; status: string; reason?: string }) {
  return runChecked(async () => {
    const i = z.object({ revisionId: z.uuid(), status: z.string(), reason: z.string().optional() }).parse(input);
    return (await moveRevisionStatus(i.revisionId, { status: i.status, reason: i.reason })).revision;
  });
}

/** The board's document as a new schematic beside this one (lib/persistence/variants.ts). */
export async function saveAsVariant(input: { schematicId: string; doc: unknown; name: string }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: uuid, doc: z.unknown(), name: z.string().trim().min(1).max(160) }).parse(input);
    return makeVariant(i.schematicId, i.doc, i.name);
  });
}

export async function startNewDraft(input: { schematicId: string }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: uuid }).parse(input);
    const { user } = await requireSchematicAccess(i.schematicId, "edit");
    const r = await q.startNewDraft({ schematicId: i.schematicId, userId: user.id });
    return r.ok ? r : refusal(r);
  });
}

/**
 * Runs the engine on the board's current document: with a schematicId the caller must be allowed to size
 * that schematic, and the answer is kept as the draft's last sizing (with the document it was for), so it
 * is there on the next opening for everyone who may read the draft; without one (a document not saved
 * anywhere) they must be allowed to size on some project.
 */
export async function sizeSchematic(input: { schematicId?: string; doc: unknown }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: uuid.optional(), doc: z.unknown() }).parse(input);
    const access = i.schematicId ? await requireSchematicAccess(i.schematicId, "size") : null;
    if (!access) await requireActionOnSomeProject("schematic.size");
    const r = sizeToAnswer(JSON.stringify(i.doc ?? null), () => ({ ok: true, value: i.doc }));
    if (!(r instanceof Answer)) return r;
    const results = r.results();
    if (access) {
      const parsed = parseSchematic(i.doc);
      if (parsed.ok) await keepDraftSizing(access.schematic.id, parsed.doc, new TextDecoder().decode(r.json), access.user.id);
    }
    return results;
  });
}
