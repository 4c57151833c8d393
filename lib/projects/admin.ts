import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole, requireUser } from "@/lib/auth/authorize";
import { AuthError, UserError } from "@/lib/auth/errors";
import { can, actions, rolesThatCan, type Action, type ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";
import {
  archiveProjectRow, deleteProjectRow, firmOfUser, getProjectHead, insertProject, issuedRevisionCount, mayCreateProjects, projectNameTaken,
} from "@/db/queries/project-admin";

export const newProjectInput = z.object({
  name: z.string({ error: "Project name is required." }).trim().min(1, "Project name is required.").max(160, "Project name must be at most 160 characters."),
  client: z.string().trim().max(160, "Client must be at most 160 characters.").default(""),
  site: z.string().trim().max(240, "Site must be at most 240 characters.").default(""),
});

const nameTaken = (name: string) => new UserError(409, `Your firm already has a project called "${name}" (names are compared ignoring case). Choose another name.`);

/** A new project in the caller's firm, for firm owners and designers; the caller becomes its owner. */
export async function createProject(raw: unknown): Promise<{ id: string; name: string }> {
  const user = await requireUser();
  const input = newProjectInput.parse(raw);
  const firm = await firmOfUser(user.id);
  if (!firm) throw new UserError(409, "You are not in a firm yet, so there is nowhere to create a project. Ask your firm's owner to invite you.");
  const creators = rolesThatCan("schematic.edit");
  if (!(await mayCreateProjects(firm, user.id, creators))) {
    throw new AuthError(403, "Only your firm's owners, and people who are an owner or designer on one of its projects, can create projects. Ask your firm's owner to create it, or to make you a designer.");
  }
  if (await projectNameTaken(firm, input.name)) throw nameTaken(input.name);
  const project = await insertProject(firm, user.id, input);
  if (!project) throw nameTaken(input.name); // created by someone else a moment ago
  await audit({ actorId: user.id, action: "project.created", projectId: project.id, target: project.name, ip: await requestIp() });
  return project;
}

export async function readProject(projectId: string) {
  const { role } = await requireProjectRole(projectId, "project.read");
  const head = await getProjectHead(projectId);
  const allowed = Object.fromEntries(actions.map((a) => [a, can(role, a)])) as Record<Action, boolean>;
  return { project: head, role: role as ProjectRole, can: allowed };
}

export type DeleteOutcome = { deleted: true } | { archived: true; message: string };

/**
 * Owner only; audited. A project holding issued revisions cannot be deleted (they are the
 * record installers built from, and the database refuses to delete them): it is archived
 * instead, and the answer says why.
 */
export async function deleteProject(projectId: string): Promise<DeleteOutcome> {
  const { user } = await requireProjectRole(projectId, "project.delete");
  const head = await getProjectHead(projectId);
  const issued = await issuedRevisionCount(projectId);
  const ip = await requestIp();
  if (issued > 0) {
    await archiveProjectRow(projectId);
    await audit({ actorId: user.id, action: "project.archived", projectId, target: head?.name ?? projectId, detail: { issuedRevisions: issued }, ip });
    return {
      archived: true,
      message: `"${head?.name}" has ${issued} issued revision${issued === 1 ? "" : "s"}, which are kept as the record of what was built, so the project was archived instead of deleted.`,
    };
  }
  await deleteProjectRow(projectId);
  // the project row is gone, so the audit row keeps its id as the target, not as a reference
  await audit({ actorId: user.id, action: "project.deleted", target: projectId, detail: { name: head?.name }, ip });
  return { deleted: true };
}
