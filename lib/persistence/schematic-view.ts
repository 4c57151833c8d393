import "server-only";
import { AuthError, requireSchematicAccess, type SchematicAccess } from "@/lib/auth/authorize";
import { getRevision, getSchematic, listRevisions, type RevisionRecord } from "@/db/queries/schematics";
import { draftIsReadOnly } from "@/lib/revisions/draft-state";

/** What the board needs to open a schematic; shared by its page and GET /api/v1/schematics/:id. */
export interface SchematicView {
  schematic: { id: string; projectId: string; name: string; kind: "team" | "practice"; variantOf: string | null;
    lockVersion: number; updatedAt: string };
  /** The stored draft (or issued document for installers); the board parses and migrates it. */
  doc: unknown;
  revisions: RevisionRecord[];
  readOnly: boolean;
  /** The caller's role may edit this schematic (an issued lock aside). */
  mayEdit: boolean;
  /** Why it is read-only, for the banner. */
  readOnlyReason: "issued" | "role" | null;
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

export async function schematicView(access: SchematicAccess): Promise<SchematicView | null> {
  const canEdit = !access.issuedOnly && (await mayDo(access.schematic.id, "edit"));
  const s = await getSchematic(access.schematic.id);
  if (!s) return null;
  let revisions = await listRevisions(s.id);
  let doc = s.draft;
  const latest = revisions[0] ?? null;
  const issuedLock = draftIsReadOnly({ draftUpdatedAt: s.updatedAt, latest });
  if (access.issuedOnly) {
    revisions = revisions.filter((r) => r.status === "issued");
    const top = revisions[0];
    doc = top ? (await getRevision(top.id))?.document ?? null : null;
  }
  return {
    schematic: { id: s.id, projectId: s.projectId, name: s.name, kind: s.kind, variantOf: s.variantOf, lockVersion: s.lockVersion,
      updatedAt: s.updatedAt },
    doc,
    revisions,
    readOnly: issuedLock || !canEdit,
    mayEdit: canEdit,
    readOnlyReason: issuedLock ? "issued" : canEdit ? null : "role",
  };
}
