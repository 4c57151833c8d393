import { NextResponse } from "next/server";
import { listProjectsForUser } from "@/db/queries/projects";

export const dynamic = "force-dynamic";

export async function GET() {
  const projects = await listProjectsForUser(null);
  return NextResponse.json({ projects });
}
