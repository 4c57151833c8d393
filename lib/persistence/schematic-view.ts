import "server-only";
import { AuthError, requireSchematicAccess, type SchematicAccess } from "@/lib/auth/authorize";
import { getSchematic, listRevisions, type RevisionRecord } from "@/db/queries/schematics";
import { draftIsReadOnly } from "@/lib/revisions/draft-state";
import { draftSizing, revisionWithResults, type Recomputed } from "@/lib/revisions/with-results";
import type { Results, Schematic } from "@/lib/schematic";

/** Kept sizing of what is opened: a revision's own results, or the draft's last sizing. */
export interface KeptSizing {
  results: Results;
  engineVersion: string;
  /** The draft as it was when sized (draft only): the board lists what changed since. */
  sizedDocument: Schematic | null;
  sizedAt: string | null;
  sizedBy: string | null;
  /** The draft was never sized itself: these are the results of this revision number (its last saved one). */
  fromRevision: number | null;
  recomputed: Recomputed;
}

/** What the board needs to open a schematic; shared by its page and GET /api/v1/schematics/:id. */
export interface SchematicView {
  schematic: { id: string; projectId: string; name: string; kind: "team" | "practice"; variantOf: string | null;
    lockVersion: number; updatedAt: string };
  /** The stored draft, or the revision opened; the board parses and migrates it. */
  doc: unknown;
  /** The working draft, or a saved revision (read-only). */
  viewing: { kind: "draft" } | { kind: "revision"; revision: RevisionRecord };
  /** Its sizing results, when kept: anyone who may read it sees the numbers without sizing. */
  sizing: KeptSizing | null;
  revisions: RevisionRecord[];
  /** Installers see issued revisions only: no draft to switch to. */
  draftVisible: boolean;
  readOnly: boolean;
  /** The caller's role may edit this schematic (an issued lock aside). */
  mayEdit: boolean;
  /** Why it is read-only, for the banner. */
  readOnlyReason: "issued" | "role" | "revision" | null;
}

/** Whether the caller may do `mode` on the schematic (lib/auth decides; a refusal is just "no"). */
export async function mayDo(schematicId: string, mode: "edit" | "size"): Promise<boolean> {
  try {
    await requireSchematicAccess(schematicId, mode);
    return true;
  } catch (e) {
    if (e instanceof AuthError) return false;
    throw e;
  }
}

/**
 * Which revision to open. "draft" → the working draft; a revision id → that revision;
 * "default" → by role: installers the newest issued revision, reviewers the newest one
 * under review (the one they are asked to judge), everyone else the draft.
 */
export type Open = "default" | "draft" | string;

function chooseRevision(access: SchematicAccess, revisions: RevisionRecord[], open: Open): RevisionRecord | null {
  const asked = open !== "default" && open !== "draft" ? revisions.find((r) => r.id === open) : undefined;
  if (asked) return asked;
  if (access.issuedOnly) return revisions[0] ?? null;
  if (open !== "draft" && access.role === "reviewer") return revisions.find((r) => r.status === "in-review") ?? null;
  return null;
}

/**
 * A draft never sized itself (e.g. the demo's) shows its newest revision's results, measured
 * against that revision's document: the board then says what the draft changed since.
 */
async function lastRevisionSizing(latest: RevisionRecord | undefined): Promise<KeptSizing | null> {
  const r = latest ? await revisionWithResults(latest.id) : null;
  if (!r?.results || !r.engineVersion) return null;
  return { results: r.results, engineVersion: r.engineVersion, sizedDocument: r.document, sizedAt: null, sizedBy: null,
    fromRevision: r.revision.number, recomputed: r.recomputed };
}

export async function schematicView(access: SchematicAccess, open: Open = "draft"): Promise<SchematicView | null> {
  const canEdit = !access.issuedOnly && (await mayDo(access.schematic.id, "edit"));
  const s = await getSchematic(access.schematic.id);
  if (!s) return null;
  let revisions = await listRevisions(s.id);
  const issuedLock = draftIsReadOnly({ draftUpdatedAt: s.updatedAt, latest: revisions[0] ?? null });
  if (access.issuedOnly) revisions = revisions.filter((r) => r.status === "issued");
  const head = {
    schematic: { id: s.id, projectId: s.projectId, name: s.name, kind: s.kind, variantOf: s.variantOf, lockVersion: s.lockVersion, updatedAt: s.updatedAt },
    revisions, draftVisible: !access.issuedOnly, mayEdit: canEdit,
  };
  const chosen = chooseRevision(access, revisions, open);
  if (chosen) {
    const r = await revisionWithResults(chosen.id);
    if (!r) return null;
    const sizing = r.results && r.engineVersion
      ? { results: r.results, engineVersion: r.engineVersion, sizedDocument: null, sizedAt: null, sizedBy: null, fromRevision: null, recomputed: r.recomputed } : null;
    return { ...head, doc: r.document, viewing: { kind: "revision", revision: chosen }, sizing, readOnly: true, readOnlyReason: "revision" };
  }
  if (access.issuedOnly) return { ...head, doc: null, viewing: { kind: "draft" }, sizing: null, readOnly: true, readOnlyReason: "role" };
  const kept = await draftSizing(s.id);
  const sizing = kept ? { results: kept.results, engineVersion: kept.engineVersion, sizedDocument: kept.document, sizedAt: kept.sizedAt,
    sizedBy: kept.sizedBy, fromRevision: null, recomputed: kept.recomputed } : await lastRevisionSizing(revisions[0]);
  return {
    ...head, doc: s.draft, viewing: { kind: "draft" }, sizing,
    readOnly: issuedLock || !canEdit,
    readOnlyReason: issuedLock ? "issued" : canEdit ? null : "role",
  };
}
