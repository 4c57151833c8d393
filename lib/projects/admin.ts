import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole, requireUser } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import { can, actions, type Action, type ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";
import { deleteProjectRow, firmOfUser, getProjectHead, insertProject, projectNameTaken } from "@/db/queries/project-admin";

export const newProjectInput = z.object({
  name: z.string({ error: "Project name is required." }).trim().min(1, "Project name is required.").max(160, "Project name must be at most 160 characters."),
  client: z.string().trim().max(160, "Client must be at most 160 characters.").default(""),
  site: z.string().trim().max(240, "Site must be at most 240 characters.").default(""),
});

export async function createProject(raw: unknown): Promise<{ id: string; name: string }> {
  const user = await requireUser();
  const input = newProjectInput.parse(raw);
  const firm = await firmOfUser(user.id);
  if (!firm) throw new UserError(409, "You are not in a firm yet, so there is nowhere to create a project. Ask your firm's owner to invite you.");
  if (await projectNameTaken(firm, input.name)) throw new UserError(409, `Your firm already has a project called "${input.name}". Choose another name.`);
  const project = await insertProject(firm, user.id, input);
  await audit({ actorId: user.id, action: "project.created", projectId: project.id, target: project.name, ip: await requestIp() });
  return project;
}

export async function readProject(projectId: string) {
  const { role } = await requireProjectRole(projectId, "project.read");
  const head = await getProjectHead(projectId);
  const allowed = Object.fromEntries(actions.map((a) => [a, can(role, a)])) as Record<Action, boolean>;
  return { project: head, role: role as ProjectRole, can: allowed };
}

export async function deleteProject(projectId: string): Promise<void> {
  const { user } = await requireProjectRole(projectId, "project.delete");
  const head = await getProjectHead(projectId);
  await deleteProjectRow(projectId);
  // the project row is gone, so the audit row keeps its id as the target, not as a reference
  await audit({ actorId: user.id, action: "project.deleted", target: projectId, detail: { name: head?.name }, ip: await requestIp() });
}
