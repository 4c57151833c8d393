"use server";

import { z } from "zod";
import { requireProjectRole } from "@/lib/auth/authorize";
import { createSchematic } from "@/db/queries/schematics";
import { copyDemoProject, createProject, updateProject } from "@/lib/projects/admin";
import { refusal, runChecked } from "@/lib/persistence/outcome";
import { makeVariant } from "@/lib/persistence/variants";
import { blankSchematic } from "@/lib/persistence/new-schematic";

// Projects and their schematics: a new project (anyone in a firm), a copy of the demo project,
// changing or archiving a project (owners, designers); a new, empty team schematic that starts
// from the project's design defaults (designers, owners) and a private practice copy of a team
// schematic (trainees; designers get a team variant).

export async function createProjectAction(input: unknown) {
  return runChecked(() => createProject(input));
}

export async function copyDemoProjectAction() {
  return runChecked(() => copyDemoProject());
}

export async function updateProjectAction(input: { projectId: string; change: unknown }) {
  return runChecked(async () => {
    const i = z.object({ projectId: z.uuid("must be a project id"), change: z.unknown() }).parse(input);
    return updateProject(i.projectId, i.change);
  });
}

export async function createSchematicAction(input: { projectId: string; name: string }) {
  return runChecked(async () => {
    const i = z.object({ projectId: z.uuid(), name: z.string().trim().min(1, "give the schematic a name").max(160) }).parse(input);
    const { user } = await requireProjectRole(i.projectId, "schematic.edit");
    const doc = await blankSchematic(i.projectId, i.name);
    const r = await createSchematic({ projectId: i.projectId, name: i.name, doc, userId: user.id, kind: "team" });
    return r.ok ? { id: r.schematic.id } : refusal(r);
  });
}

export async function newVariantAction(input: { schematicId: string }) {
  return runChecked(async () => {
    const i = z.object({ schematicId: z.uuid() }).parse(input);
    return makeVariant(i.schematicId, undefined, undefined);
  });
}
