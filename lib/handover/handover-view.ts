import "server-only";
import { can, requireSchematicAccess } from "@/lib/auth/authorize";
import { AuthError } from "@/lib/auth/errors";
import { listRevisions } from "@/db/queries/schematics";
import { getProjectHead } from "@/db/queries/project-admin";
import { db } from "@/lib/db";

// What the handover screen opens with: the revisions the caller may read (installers:
// issued only), the one shown (?rev=, else the newest issued, else the newest), the client's
// address and what the caller may do.

export interface HandoverView {
  projectId: string; projectName: string; schematicId: string; schematicName: string; clientEmail: string;
  revision: { id: string; number: number; status: string };
  revisions: { id: string; number: number; status: string }[];
  canSend: boolean; canUploadPrices: boolean;
}

export async function handoverView(schematicId: string, rev: string | null): Promise<HandoverView> {
  const access = await requireSchematicAccess(schematicId, "read");
  let revisions = await listRevisions(schematicId);
  if (access.issuedOnly) revisions = revisions.filter((r) => r.status === "issued");
  if (!revisions.length) throw new AuthError(403, access.issuedOnly ? "No revision of this schematic is issued yet: its handover pack comes with the issued revision." : "This schematic has no saved revision yet: save and issue one to hand it over.");
  const shown = (rev && revisions.find((r) => r.id === rev)) || revisions.find((r) => r.status === "issued") || revisions[0]!;
  const [project, schematic] = await Promise.all([getProjectHead(access.schematic.projectId), db()("schematics").where({ id: schematicId }).first("name")]);
  return {
    projectId: access.schematic.projectId, projectName: project?.name ?? "", schematicId, schematicName: schematic?.name ?? "", clientEmail: project?.clientEmail ?? "",
    revision: { id: shown.id, number: shown.number, status: shown.status },
    revisions: revisions.map((r) => ({ id: r.id, number: r.number, status: r.status })),
    canSend: can(access.role, "handover.send"), canUploadPrices: can(access.role, "project.update"),
  };
}
