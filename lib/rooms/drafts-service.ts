import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { can, forbidden, requireProjectRole } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { getRooms } from "@/db/queries/rooms";
import { createSchematic, freeSchematicName, getSchematic } from "@/db/queries/schematics";
import { generateDraft } from "./draft";
import { firmList, type Answer } from "./service";

// POST …/drafts: a first draft from the project's saved rooms and a plant choice, saved as a
// new schematic (listed as a variant of `variantOf` when the body names one of the project's). Owners and designers get a team schematic; a trainee gets a private
// practice one (as with variants). The answer names it, with the draft's own findings and
// the engine's errors and warnings on it.

const envelope = z.object({ plant: z.unknown(), name: z.string().trim().min(1).max(160).optional(), variantOf: z.uuid().optional() });

export async function createDraft(projectId: string, value: unknown): Promise<Answer> {
  const { user, role } = await requireProjectRole(projectId, "project.read");
  const practice = role === "trainee";
  if (!can(role, practice ? "variant.practice" : "schematic.edit")) throw forbidden("schematic.edit", role);
  const env = envelope.safeParse(value);
  if (!env.success || env.data.plant === undefined) {
    return { status: 400, body: { error: "The body must be {plant: {...}, name?, variantOf?}.", issues: [{ path: "plant", message: "plant: missing" }] } };
  }
  const variantOf = env.data.variantOf ?? null;
  if (variantOf && (await getSchematic(variantOf))?.projectId !== projectId) {
    return { status: 400, body: { error: "variantOf: no schematic of this project has that id.", issues: [{ path: "variantOf", message: "variantOf: no schematic of this project has that id" }] } };
  }
  const [{ rooms }, list] = await Promise.all([getRooms(projectId), firmList(projectId)]);
  const base = env.data.name ?? (practice ? `First draft from rooms — ${user.name}'s practice` : "First draft from rooms");
  const name = await freeSchematicName(projectId, base);
  const out = generateDraft({ rooms }, env.data.plant, { name, emitterList: list });
  if (!out.ok) {
    const shown = out.issues.slice(0, 3).map((i) => i.message).join("; ");
    return { status: 400, body: { error: `No draft: ${shown}${out.issues.length > 3 ? ` (and ${out.issues.length - 3} more)` : ""}`, issues: out.issues } };
  }
  const { schematic, results, findings } = out.draft;
  const r = await createSchematic({ projectId, name, doc: schematic, userId: user.id, kind: practice ? "practice" : "team", variantOf });
  if (!r.ok) return { status: 409, body: { error: "A schematic with that name was made at the same moment; try again." } };
  await audit({ actorId: user.id, action: "draft.generated", projectId, target: r.schematic.id, detail: { rooms: rooms.length }, ip: await requestIp() });
  const engineFindings = results.findings.filter((f) => f.severity !== "info");
  return { status: 201, body: { schematicId: r.schematic.id, projectId, name, findings, engineFindings } };
}
