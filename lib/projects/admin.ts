import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole, requireUser } from "@/lib/auth/authorize";
import { AuthError, UserError } from "@/lib/auth/errors";
import { can, actions, rolesThatCan, type Action, type ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";
import {
  archiveProjectRow, deleteProjectRow, firmOfUser, getProjectHead, insertProject, issuedRevisionCount, mayCreateProjects, projectNameTaken,
  updateProjectRow,
} from "@/db/queries/project-admin";
import { demoProjects, loadDemoDocument } from "@/db/seeds/demo/projects";
import { parseSchematic } from "@/lib/schematic";
import { designDefaultsSchema, withDesignDefaults } from "./design-defaults";

const nameField = z.string({ error: "Project name is required." }).trim().min(1, "Project name is required.").max(160, "Project name must be at most 160 characters.");
const clientField = z.string().trim().max(160, "Client must be at most 160 characters.");
const clientEmailField = z.union([z.literal(""), z.email("Client e-mail must be an e-mail address, like name@example.com.").max(254, "Client e-mail must be at most 254 characters.")]);
const siteField = z.string().trim().max(240, "Site must be at most 240 characters.");

export const newProjectInput = z.object({
  name: nameField,
  client: clientField.default(""),
  clientEmail: z.string().trim().pipe(clientEmailField).default(""),
  site: siteField.default(""),
  design: designDefaultsSchema.prefault({}),
});

/** Rename, change client, site or design defaults, archive or restore: any subset. */
export const projectChangeInput = z.object({
  name: nameField.optional(),
  client: clientField.optional(),
  clientEmail: z.string().trim().pipe(clientEmailField).optional(),
  site: siteField.optional(),
  design: designDefaultsSchema.optional(),
  archived: z.boolean({ error: "archived must be true or false." }).optional(),
}).refine((c) => Object.values(c).some((v) => v !== undefined), { message: "Say what to change: name, client, clientEmail, site, design or archived." });

const nameTaken = (name: string) => new UserError(409, `Your firm already has a project called "${name}" (names are compared ignoring case). Choose another name.`);

/** The caller's firm, when they may start projects in it: its owners, and owners or designers on one of its projects. */
async function firmToCreateIn(userId: string): Promise<string> {
  const firm = await firmOfUser(userId);
  if (!firm) throw new UserError(409, "You are not in a firm yet, so there is nowhere to create a project. Ask your firm's owner to invite you.");
  if (!(await mayCreateProjects(firm, userId, rolesThatCan("schematic.edit")))) {
    throw new AuthError(403, "Only your firm's owners, and people who are an owner or designer on one of its projects, can create projects. Ask your firm's owner to create it, or to make you a designer.");
  }
  return firm;
}

/** A new project in the caller's firm; the caller becomes its owner. */
export async function createProject(raw: unknown): Promise<{ id: string; name: string }> {
  const user = await requireUser();
  const input = newProjectInput.parse(raw);
  const firm = await firmToCreateIn(user.id);
  if (await projectNameTaken(firm, input.name)) throw nameTaken(input.name);
  const project = await insertProject(firm, user.id, { ...input, design: withDesignDefaults({}, input.design) });
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

export async function updateProject(projectId: string, raw: unknown) {
  const { user } = await requireProjectRole(projectId, "project.update");
  const change = projectChangeInput.parse(raw);
  const head = await getProjectHead(projectId);
  if (!head) throw new UserError(404, "Project not found.");
  if (change.name && change.name.toLowerCase() !== head.name.toLowerCase() && (await projectNameTaken(head.organisationId, change.name))) {
    throw nameTaken(change.name);
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
  const firm = await firmToCreateIn(user.id);
  const demo = demoProjects.find((p) => p.name === "Orchard End")!;
  let name = `${demo.name} (demo copy)`;
  for (let n = 2; await projectNameTaken(firm, name); n++) name = `${demo.name} (demo copy ${n})`;
  const project = await insertProject(firm, user.id, { name, client: demo.client, clientEmail: demo.clientEmail, site: demo.site, design: demo.design },
    demo.schematics.map((s) => ({ name: s.name, doc: demoDocument(s.file, `${demo.name} — ${s.name}`) })));
  if (!project) throw nameTaken(name);
  await audit({ actorId: user.id, action: "project.created", projectId: project.id, target: project.name, detail: { copyOf: "demo" }, ip: await requestIp() });
  return project;
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
