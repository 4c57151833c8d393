import { NextResponse } from "next/server";
import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { deleteProject, readProject, updateProject } from "@/lib/projects/admin";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ projectId: string }> };

/** The project's head, the caller's role, and what that role can do (for hiding UI). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return NextResponse.json(await readProject((await params).projectId));
});

/** Rename, change client, site or design defaults, archive ({archived: true}) or restore: owner and designer; audited. */
export const PATCH = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return NextResponse.json(await updateProject(projectId, body.value));
});

/** Owner only; audited. 204 when deleted; 200 {archived, message} when issued revisions keep it. */
export const DELETE = apiHandler(async (_req: Request, { params }: Ctx) => {
  const r = await deleteProject((await params).projectId);
  return "archived" in r ? NextResponse.json(r) : new NextResponse(null, { status: 204 });
});
