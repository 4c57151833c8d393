import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { DrawingBoard } from "@/components/drawing-board/board";
import { CanvasOverlay } from "@/components/drawing-board/overlay/canvas-overlay";
import { FindingsDock } from "@/components/drawing-board/overlay/findings-dock";
import { ResultsBar } from "@/components/drawing-board/overlay/results-bar";
import { BoardSession } from "@/components/drawing-board/persistence/board-session";
import { BoardToolbar } from "@/components/drawing-board/persistence/board-toolbar";
import { ViewingBanner } from "@/components/drawing-board/persistence/viewing-banner";
import { SizingReport } from "@/components/drawing-board/report/sizing-report";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { getProjectHead } from "@/db/queries/project-admin";
import { mayDo, schematicView } from "@/lib/persistence/schematic-view";
import { unitPrefsFrom } from "@/lib/units/display";

export const metadata: Metadata = { title: "Drawing board" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string; schematicId: string }>; searchParams: Promise<{ rev?: string }> };

/** The board; `?rev=<id>` opens a saved revision, `?rev=draft` the working draft, neither the role's default. */
export default async function BoardPage({ params, searchParams }: Params) {
  const { projectId, schematicId } = await params;
  const { rev } = await searchParams;
  const checked = await pageAccess(() => requireSchematicAccess(schematicId, "read"));
  if (!checked.ok) return <NotAllowed message={checked.message} />;
  const access = checked.value;
  if (access.schematic.projectId !== projectId) redirect(`/projects/${access.schematic.projectId}/schematics/${schematicId}`);
  const [view, canSize, project] = await Promise.all([schematicView(access, rev ?? "default"), mayDo(schematicId, "size"), getProjectHead(projectId)]);
  if (!view || !project) notFound();
  const opened = view.viewing.kind === "revision" ? view.viewing.revision.id : "draft";

  return (
    <BoardSession key={opened} view={view} projectName={project.name} role={access.role} canSize={canSize && view.viewing.kind === "draft"}
      units={unitPrefsFrom(access.user.preferences)}>
      <DrawingBoard toolbarSlot={<BoardToolbar />} reportSlot={<SizingReport />} canvasSlot={<CanvasOverlay />}
        barSlot={<><ViewingBanner /><ResultsBar /></>} dockSlot={<FindingsDock />} />
    </BoardSession>
  );
}
