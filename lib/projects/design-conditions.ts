import "server-only";
import { audit } from "@/lib/audit";
import { requireProjectRole } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { designConditionIssues } from "@/lib/hydraulics/design-conditions";
import { Refused } from "@/lib/persistence/outcome";
import { projectDefaultsFrom, projectDefaultsSchema, type ProjectDefaults } from "@/lib/schematic/project-defaults";
import { zodIssues } from "@/lib/schematic/parse";
import { getProjectDesignConditions, saveProjectDesignConditions } from "@/db/queries/project-design";

// A project's design conditions: what its new schematics start with. Readers of the
// project may read them; those who may change the project's details may set them.

export async function readProjectDefaults(projectId: string): Promise<ProjectDefaults> {
  await requireProjectRole(projectId, "project.read");
  return projectDefaultsFrom(await getProjectDesignConditions(projectId));
}

/** Refused (400, naming each field) when sizing could not use them; nothing is saved then. */
export async function setProjectDefaults(projectId: string, input: unknown): Promise<ProjectDefaults | Refused> {
  const { user } = await requireProjectRole(projectId, "project.update");
  const parsed = projectDefaultsSchema.safeParse(input);
  if (!parsed.success) {
    const issues = zodIssues(parsed.error);
    return new Refused(400, `Design conditions not saved: ${issues.map((i) => i.message).join("; ")}`, { issues });
  }
  const issues = designConditionIssues(parsed.data.design, parsed.data.fluid);
  if (issues.length > 0) {
    return new Refused(400, `Design conditions not saved: ${issues.map((i) => `${i.path}: ${i.message}`).join(" ")}`, {
      issues: issues.map((i) => ({ path: i.path, message: `${i.path}: ${i.message}` })),
    });
  }
  await saveProjectDesignConditions(projectId, parsed.data);
  await audit({ actorId: user.id, action: "project.design-conditions", projectId, target: projectId, ip: await requestIp() });
  return parsed.data;
}
