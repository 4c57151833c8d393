import { NextResponse } from "next/server";
import { listProjectsForUser } from "@/db/queries/projects";
import { apiHandler, requireUser } from "@/lib/auth/authorize";
import { createProject } from "@/lib/projects/admin";

export const dynamic = "force-dynamic";

/** The caller's projects only. */
export const GET = apiHandler(async () => {
  const user = await requireUser();
  return NextResponse.json({ projects: await listProjectsForUser(user.id) });
});

/** Create a project in the caller's firm; the caller becomes its owner. */
export const POST = apiHandler(async (req: Request) => {
  const project = await createProject(await req.json());
  return NextResponse.json({ project }, { status: 201 });
});
