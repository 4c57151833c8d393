import "server-only";
import { z } from "zod";
import { AuthError, can, forbidden, requireProjectRole } from "@/lib/auth/authorize";
import { createSchematic } from "@/db/queries/schematics";
import { getProjectDesignConditions } from "@/db/queries/project-design";
import { checkReadable, loadDesign } from "@/lib/compare/read-ref";
import { refSchema, refText } from "@/lib/compare/refs";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import { projectDefaultsFrom, withProjectDefaults } from "@/lib/schematic/project-defaults";
import { Refused, refusal } from "./outcome";

// POST /api/v1/projects/{id}/schematics: a new schematic or variant, empty (with the
// project's design conditions) or a copy of a design the caller can read (`from`: a
// schematic's working draft or a revision, of this project). Team schematics: owners and
// designers; practice variants (private): anyone who may make them — a trainee only those.

export const newSchematicInput = z.object({
  name: z.string({ error: "give the schematic a name" }).trim().min(1, "give the schematic a name").max(160, "at most 160 characters"),
  kind: z.enum(["team", "practice"], { error: 'kind is "team" or "practice"' }),
  from: refSchema.optional(),
});

/** An empty schematic that starts from the project's design conditions. */
export async function blankSchematic(projectId: string, name: string): Promise<Schematic> {
  const doc = parseSchematic({ format: "loopwright/schematic", version: 1, name });
  if (!doc.ok) throw new Error("the blank schematic does not parse"); // a bug, not user input
  return withProjectDefaults(doc.doc, projectDefaultsFrom(await getProjectDesignConditions(projectId)));
}

/** `body` is read once the caller is known to be a member (signed out → 401 before any parsing). */
export async function newSchematic(projectId: string, body: () => Promise<unknown>) {
  const { user, role } = await requireProjectRole(projectId, "project.read");
  const i = newSchematicInput.parse(await body());
  const action = i.kind === "team" ? "schematic.edit" : "variant.practice";
  if (!can(role, action)) {
    throw role === "trainee" ? new AuthError(403, 'A trainee makes practice variants only: send kind "practice".') : forbidden(action, role);
  }
  let doc: Schematic;
  let variantOf: string | null = null;
  if (i.from) {
    const source = await loadDesign(await checkReadable(i.from, "from"), "from", { results: false });
    if (source.projectId !== projectId) {
      const message = `${refText(i.from)} belongs to another project; copy designs within one project.`;
      return new Refused(400, `from: ${message}`, { issues: [{ path: "from", message }] });
    }
    doc = { ...source.document, name: i.name };
    variantOf = source.schematicId;
  } else {
    doc = await blankSchematic(projectId, i.name);
  }
  const r = await createSchematic({ projectId, name: i.name, doc, userId: user.id, kind: i.kind, variantOf });
  if (!r.ok) return refusal(r);
  const { draft: _draft, ...schematic } = r.schematic;
  return { schematic };
}
