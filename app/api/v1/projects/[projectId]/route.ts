import { NextResponse } from "next/server";
import { apiHandler } from "@/lib/auth/authorize";
import { deleteProject, readProject } from "@/lib/projects/admin";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ projectId: string }> };

/** The project's head, the caller's role, and what that role can do (for hiding UI). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return NextResponse.json(await readProject((await params).projectId));
});

/** Owner only; audited. 204 when deleted; 200 {archived, message} when issued revisions keep it. */
export const DELETE = apiHandler(async (_req: Request, { params }: Ctx) => {
  const r = await deleteProject((await params).projectId);
  return "archived" in r ? NextResponse.json(r) : new NextResponse(null, { status: 204 });
});
