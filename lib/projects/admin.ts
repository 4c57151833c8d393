import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole, requireUser } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import { can, actions, type Action, type ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";
import { deleteProjectRow, firmOfUser, getProjectHead, insertProject, projectNameTaken, updateProjectRow } from "@/db/queries/project-admin";
import { demoProjects, loadDemoDocument } from "@/db/seeds/demo/projects";
import { parseSchematic } from "@/lib/schematic";
import { designDefaultsSchema, withDesignDefaults } from "./design-defaults";

const nameField = z.string({ error: "Project name is required." }).trim().min(1, "Project name is required.").max(160, "Project name must be at most 160 characters.");
const clientField = z.string().trim().max(160, "Client must be at most 160 characters.");
const siteField = z.string().trim().max(240, "Site must be at most 240 characters.");

export const newProjectInput = z.object({
  name: nameField,
  client: clientField.default(""),
  site: siteField.default(""),
  design: designDefaultsSchema.prefault({}),
});

/** Rename, change client, site or design defaults, archive or restore: any subset. */
export const projectChangeInput = z.object({
  name: nameField.optional(),
  client: clientField.optional(),
  site: siteField.optional(),
  design: designDefaultsSchema.optional(),
  archived: z.boolean({ error: "archived must be true or false." }).optional(),
}).refine((c) => Object.values(c).some((v) => v !== undefined), { message: "Say what to change: name, client, site, design or archived." });

async function firmFor(userId: string): Promise<string> {
  const firm = await firmOfUser(userId);
  if (!firm) throw new UserError(409, "You are not in a firm yet, so there is nowhere to create a project. Ask your firm's owner to invite you.");
  return firm;
}

export async function createProject(raw: unknown): Promise<{ id: string; name: string }> {
  const user = await requireUser();
  const input = newProjectInput.parse(raw);
  const firm = await firmFor(user.id);
  if (await projectNameTaken(firm, input.name)) throw new UserError(409, `Your firm already has a project called "${input.name}". Choose another name.`);
  const project = await insertProject(firm, user.id, { ...input, design: withDesignDefaults({}, input.design) });
  await audit({ actorId: user.id, action: "project.created", projectId: project.id, target: project.name, ip: await requestIp() });
  return project;
}

export async function readProject(projectId: string) {
  const { role } = await requireProjectRole(projectId, "project.read");
  const head = await getProjectHead(projectId);
  const allowed = Object.fromEntries(actions.map((a) => [a, can(role, a)])) as Record<Action, boolean>;
  return { project: head, role: role as ProjectRole, can: allowed };
}

export async function updateProject(projectId: string, raw: unknown) {
  const { user } = await requireProjectRole(projectId, "project.update");
  const change = projectChangeInput.parse(raw);
  const head = await getProjectHead(projectId);
  if (!head) throw new UserError(404, "Project not found.");
  if (change.name && change.name.toLowerCase() !== head.name.toLowerCase() && (await projectNameTaken(head.organisationId, change.name))) {
    throw new UserError(409, `Your firm already has a project called "${change.name}". Choose another name.`);
  }
  await updateProjectRow(projectId, { ...change, design: change.design ? withDesignDefaults(head.design, change.design) : undefined });
  const action = change.archived === true ? "project.archived" : change.archived === false ? "project.restored" : "project.updated";
  await audit({ actorId: user.id, action, projectId, target: change.name ?? head.name, detail: { ...change }, ip: await requestIp() });
  return { project: await getProjectHead(projectId) };
}

function demoDocument(file: string, name: string) {
  const parsed = parseSchematic(loadDemoDocument(file, name));
  if (!parsed.ok) throw new Error(`demo document ${file} does not parse: ${parsed.issues[0]?.message}`); // a bug, not user input
  return parsed.doc;
}

/** A copy of the demo house (Orchard End, both variants as drafts) in the caller's firm, to learn on. */
export async function copyDemoProject(): Promise<{ id: string; name: string }> {
  const user = await requireUser();
  const firm = await firmFor(user.id);
  const demo = demoProjects.find((p) => p.name === "Orchard End")!;
  let name = `${demo.name} (demo copy)`;
  for (let n = 2; await projectNameTaken(firm, name); n++) name = `${demo.name} (demo copy ${n})`;
  const project = await insertProject(firm, user.id, { name, client: demo.client, site: demo.site, design: demo.design },
    demo.schematics.map((s) => ({ name: s.name, doc: demoDocument(s.file, `${demo.name} — ${s.name}`) })));
  await audit({ actorId: user.id, action: "project.created", projectId: project.id, target: project.name, detail: { copyOf: "demo" }, ip: await requestIp() });
  return project;
}

export async function deleteProject(projectId: string): Promise<void> {
  const { user } = await requireProjectRole(projectId, "project.delete");
  const head = await getProjectHead(projectId);
  await deleteProjectRow(projectId);
  // the project row is gone, so the audit row keeps its id as the target, not as a reference
  await audit({ actorId: user.id, action: "project.deleted", target: projectId, detail: { name: head?.name }, ip: await requestIp() });
}
