import "server-only";
import { requireProjectRole, requireSchematicAccess } from "@/lib/auth/authorize";
import { createSchematic, freeSchematicName, getSchematic } from "@/db/queries/schematics";
import { parseSchematic } from "@/lib/schematic";
import { invalidDocument, refusal, Refused } from "./outcome";

/**
 * A copy of a schematic as a new one beside it (variant_of = the original).
 * Designers and owners get a team variant; trainees a private practice one.
 * `doc` is the board's unsaved document (conflict: "save mine as a variant");
 * without it the stored draft is copied (project page: "new practice variant").
 */
export async function makeVariant(schematicId: string, doc: unknown | undefined, name: string | undefined) {
  const { user, role, schematic } = await requireSchematicAccess(schematicId, "read");
  const { role: allowed } = await requireProjectRole(schematic.projectId, role === "trainee" ? "variant.practice" : "schematic.edit");
  const original = await getSchematic(schematicId);
  if (!original) return new Refused(404, "Schematic not found.");
  const parsed = parseSchematic(doc === undefined ? original.draft : doc);
  if (!parsed.ok) return invalidDocument(parsed.issues);
  const practice = allowed === "trainee";
  const base = name ?? (practice ? `${original.name} — ${user.name}'s practice` : `${original.name} (variant)`);
  const r = await createSchematic({ projectId: schematic.projectId, name: await freeSchematicName(schematic.projectId, base),
    doc: parsed.doc, userId: user.id, kind: practice ? "practice" : "team", variantOf: schematic.id });
  return r.ok ? { id: r.schematic.id, name: r.schematic.name, projectId: r.schematic.projectId } : refusal(r);
}
