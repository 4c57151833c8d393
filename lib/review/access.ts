import "server-only";
import { db } from "@/lib/db";
import { AuthError, can, isUuid, requireSchematicAccess, requireUser, type SchematicAccess } from "@/lib/auth/authorize";
import { threadPlace } from "@/db/queries/threads";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import type { Person } from "./types";

// Who may read and write review threads (product.md: Review; issue "who may write").
// Reading follows the schematic's read rule (lib/auth), installers only on issued
// revisions. Writing: owner, designer and reviewer anywhere they can read; an installer
// on issued revisions only (questions from site); a trainee on their own practice
// variants only. A refusal is a 403 with a message, before anything is written.

/** Why this caller may not write on a revision with this status; null when they may. */
export function writeRefusal(access: SchematicAccess, revisionStatus: RevisionStatus): string | null {
  const { role, schematic, user } = access;
  if (can(role, "comment.write")) return null;
  if (role === "installer") {
    return revisionStatus === "issued" ? null
      : `Installers can write only on issued revisions (questions from site); this revision is ${revisionStatus}.`;
  }
  if (role === "trainee") {
    return schematic.kind === "practice" && schematic.ownerId === user.id ? null
      : "Trainees can write threads only on their own practice variants; this schematic is the team's.";
  }
  return `Your role on this project (${role}) cannot write threads.`;
}

/** The schematic's read rule plus, for installers, an issued revision. */
export function requireRevisionVisible(access: SchematicAccess, revisionStatus: RevisionStatus): void {
  if (access.issuedOnly && revisionStatus !== "issued") {
    throw new AuthError(403, "Installers see issued revisions only, and their threads; this one is not issued.");
  }
}

export async function requireWriteOn(schematicId: string, revisionStatus: RevisionStatus): Promise<SchematicAccess> {
  const access = await requireSchematicAccess(schematicId, "read");
  requireRevisionVisible(access, revisionStatus);
  const why = writeRefusal(access, revisionStatus);
  if (why) throw new AuthError(403, why);
  return access;
}

/** A thread the caller may read (mode "read") or write on (mode "write"); 404 for a thread that does not exist. */
export async function requireThreadAccess(threadId: string, mode: "read" | "write") {
  await requireUser(); // signed out → 401 before anything is looked up
  const place = isUuid(threadId) ? await threadPlace(threadId) : null;
  if (!place) throw new AuthError(404, "Thread not found, or you cannot read the schematic it is on.");
  const access = mode === "write" ? await requireWriteOn(place.schematicId, place.revisionStatus) : await requireSchematicAccess(place.schematicId, "read");
  if (mode === "read") requireRevisionVisible(access, place.revisionStatus);
  return { access, place };
}

/**
 * Project members who may read threads on a revision with this status: the people a
 * message can mention. Practice variants: their maker and the project's owners.
 */
export async function readersOf(schematic: SchematicAccess["schematic"], revisionStatus: RevisionStatus | null): Promise<(Person & { email: string; role: string })[]> {
  const rows = await db()("project_members as m").join("users as u", "u.id", "m.user_id").where("m.project_id", schematic.projectId)
    .select("u.id", "u.name", "u.email", "m.role").orderBy("u.name");
  return rows.filter((r) => {
    if (schematic.kind === "practice") return r.id === schematic.ownerId || r.role === "owner";
    return r.role !== "installer" || revisionStatus === "issued";
  });
}
