import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { can, requireProjectRole } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { RoomsWorkspace } from "@/components/rooms/rooms-workspace";
import { getProjectHead } from "@/db/queries/project-admin";
import { firmOfProject, getFirmEmitters, getRooms } from "@/db/queries/rooms";

export const metadata: Metadata = { title: "Rooms" };
export const dynamic = "force-dynamic";

export default async function RoomsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const access = await pageAccess(() => requireProjectRole(projectId, "project.read"));
  if (!access.ok) return <NotAllowed message={access.message} />;
  const { role } = access.value;
  const [project, rooms, firm] = await Promise.all([getProjectHead(projectId), getRooms(projectId), firmOfProject(projectId)]);
  if (!project) notFound();
  const emitters = firm ? (await getFirmEmitters(firm)).emitters : [];
  const practice = role === "trainee";
  return (
    <main className="mx-auto max-w-6xl px-4 py-8">
      <p className="text-sm text-ink-faint">
        <Link href="/projects" className="hover:text-copper-600">Projects</Link> / <Link href={`/projects/${projectId}`} className="hover:text-copper-600">{project.name}</Link> / Rooms
      </p>
      <h1 className="mt-1 text-2xl font-semibold">Rooms and heat losses</h1>
      <p className="mt-1 text-sm text-ink-soft">Each room&apos;s design temperature, heat loss and emitter: check them against a heat pump&apos;s flow temperature, then draw a first design.</p>
      <RoomsWorkspace projectId={projectId} initialRooms={rooms.rooms} initialLockVersion={rooms.lockVersion} emitters={emitters}
        canEdit={can(role, "rooms.edit")} canDraft={practice ? can(role, "variant.practice") : can(role, "schematic.edit")} practice={practice} />
    </main>
  );
}
