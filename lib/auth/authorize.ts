import "server-only";
import { db } from "@/lib/db";
import { AuthError, errorBody, type Issue } from "./errors";
import { actionWords, can, isProjectRole, rolesThatCan, type Action, type ProjectRole } from "./policy";
import { RequestScope } from "./request-context";
import { boundBodyReaders } from "@/lib/http/body";
import { contentTypeRefusal, originRefusal } from "@/lib/http/request-guard";
import { getCurrentUser, type SessionUser } from "./session";

// The one place every route handler and server action asks "who is this, and may they?".
// The policy table itself is in ./policy.ts (pure, importable by client components to hide UI).

export { can, AuthError, rolesThatCan, actionWords };
export type { Action, ProjectRole, SessionUser };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: unknown): s is string => typeof s === "string" && UUID.test(s);

export async function requireUser(): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) throw new AuthError(401, "Please sign in first: this needs a signed-in account.");
  return user;
}

/** The caller's role on a project, or null when they are not a member (or it does not exist). */
export async function roleOnProject(userId: string, projectId: string): Promise<ProjectRole | null> {
  if (!isUuid(projectId)) return null;
  const row = await db()("project_members").where({ project_id: projectId, user_id: userId }).first("role");
  return row && isProjectRole(row.role) ? row.role : null;
}

function roleList(roles: ProjectRole[]): string {
  return roles.length <= 1 ? roles.join("") : `${roles.slice(0, -1).join(", ")} or ${roles[roles.length - 1]}`;
}

export function forbidden(action: Action, role: ProjectRole): AuthError {
  return new AuthError(403, `Only a project ${roleList(rolesThatCan(action))} can ${actionWords[action]}; your role on this project is ${role}.`);
}

const notFound = () => new AuthError(404, "Project not found, or you are not a member of it.");

export async function requireProjectRole(projectId: string, action: Action): Promise<{ user: SessionUser; role: ProjectRole }> {
  const user = await requireUser();
  const role = await roleOnProject(user.id, projectId);
  if (!role) throw notFound();
  if (!can(role, action)) throw forbidden(action, role);
  return { user, role };
}

/**
 * For work tied to no one project (sizing a document that is not saved, in the open
 * calculator): the caller must hold a role allowing `action` on at least one project.
 */
export async function requireActionOnSomeProject(action: Action): Promise<SessionUser> {
  const user = await requireUser();
  const roles = rolesThatCan(action);
  const row = await db()("project_members").where({ user_id: user.id }).whereIn("role", roles).first("project_id");
  if (!row) throw new AuthError(403, `Only a project ${roleList(roles)} can ${actionWords[action]}, and none of your projects gives you one of those roles.`);
  return user;
}

export type SchematicAccess = {
  user: SessionUser;
  role: ProjectRole;
  schematic: { id: string; projectId: string; kind: "team" | "practice"; ownerId: string | null };
  /** true for installers: show and serve only issued revisions. */
  issuedOnly: boolean;
};

/**
 * Schematic-level checks on top of the role table:
 * - team schematic: read → any member (installers only once a revision is issued, and then
 *   only issued revisions); edit and size → owner or designer.
 * - practice variant (a trainee's private copy): read → its maker and whoever reads others'
 *   practice variants (policy "variant.read-practice": the project's owners and reviewers);
 *   edit and size → its maker only. To anyone else it answers 404, as if it did not exist.
 */
export async function requireSchematicAccess(schematicId: string, mode: "read" | "edit" | "size"): Promise<SchematicAccess> {
  const user = await requireUser();
  const row = isUuid(schematicId)
    ? await db()("schematics").where({ id: schematicId }).first("id", "project_id", "kind", "owner_id")
    : undefined;
  const role = row ? await roleOnProject(user.id, row.project_id) : null;
  if (!row || !role) throw new AuthError(404, "Schematic not found, or you are not a member of its project.");
  const schematic = { id: row.id as string, projectId: row.project_id as string, kind: row.kind as "team" | "practice", ownerId: row.owner_id as string | null };
  const mine = schematic.ownerId === user.id;
  let issuedOnly = false;

  if (schematic.kind === "practice") {
    if (!mine && !can(role, "variant.read-practice")) throw new AuthError(404, "Schematic not found, or you are not a member of its project.");
    if (mode !== "read" && !mine) throw new AuthError(403, "Only the person who made this practice variant can change or size it.");
    if (mode !== "read" && !can(role, "variant.practice")) throw forbidden("variant.practice", role);
  } else if (mode === "read") {
    if (!can(role, "schematic.read")) throw forbidden("schematic.read", role);
    if (role === "installer") {
      const issued = await db()("schematic_revisions").where({ schematic_id: schematic.id, status: "issued" }).first("id");
      if (!issued) throw new AuthError(403, "Installers see a schematic once a revision of it has been issued.");
      issuedOnly = true;
    }
  } else {
    if (!can(role, "schematic.edit")) throw forbidden("schematic.edit", role);
    if (mode === "size" && !can(role, "schematic.size")) throw forbidden("schematic.size", role);
  }
  return { user, role, schematic, issuedOnly };
}

// ——— wrappers: one error mapping for route handlers and server actions ———

function isNextControlFlow(err: unknown): boolean {
  const digest = (err as { digest?: unknown } | null)?.digest;
  return typeof digest === "string" && (digest.startsWith("NEXT_") || digest === "DYNAMIC_SERVER_USAGE" || digest === "BAILOUT_TO_CLIENT_SIDE_RENDERING");
}

function withCookies(res: Response, setCookies: string[]): Response {
  if (setCookies.length === 0) return res;
  const headers = new Headers(res.headers);
  for (const c of setCookies) headers.append("set-cookie", c);
  return new Response(res.body, { status: res.status, statusText: res.statusText, headers });
}

export type ApiOptions = {
  /** Body media types this route takes on POST/PUT/PATCH/DELETE; default ["application/json"]. */
  accepts?: readonly string[];
};

/**
 * Route-handler wrapper. Before the handler runs, a state-changing request must come from
 * this app's own pages (Origin) with a body of a type the route accepts (lib/http/request-guard.ts);
 * every way of reading the body goes through the one bounded reader (lib/http/body.ts: byte
 * and JSON-depth limits). Reads the session from the Request itself (so handlers can be
 * called directly in tests), copies cookies set during the call onto the Response, and maps
 * AuthError → 401/403/404, ZodError → 400 {error, issues}, UserError → its status, anything
 * else → 500 with a generic message (the real error is logged, never sent).
 */
export function apiHandler<C>(fn: (req: Request, ctx: C) => Promise<Response>, options: ApiOptions = {}): (req: Request, ctx: C) => Promise<Response> {
  const accepts = options.accepts ?? ["application/json"];
  return async (req, ctx) => {
    const refusal = originRefusal(req) ?? contentTypeRefusal(req, accepts);
    if (refusal) return Response.json({ error: refusal.error }, { status: refusal.status });
    boundBodyReaders(req);
    const scope = RequestScope.fromRequest(req);
    try {
      const res = await scope.run(() => fn(req, ctx));
      return withCookies(res, scope.setCookies);
    } catch (err) {
      if (isNextControlFlow(err)) throw err;
      const { status, error, issues, headers } = errorBody(err);
      return withCookies(Response.json(issues ? { error, issues } : { error }, { status, headers }), scope.setCookies);
    }
  };
}

export type ActionResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; issues?: Issue[] };

/** Server-action wrapper with the same mapping; redirect()/notFound() pass through. */
export async function runAction<T>(fn: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await fn() };
  } catch (err) {
    if (isNextControlFlow(err)) throw err;
    const { status, error, issues } = errorBody(err);
    return issues ? { ok: false, status, error, issues } : { ok: false, status, error };
  }
}
