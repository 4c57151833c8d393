import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { DrawingBoard } from "@/components/drawing-board/board";
import { CanvasOverlay } from "@/components/drawing-board/overlay/canvas-overlay";
import { BoardSession } from "@/components/drawing-board/persistence/board-session";
import { BoardToolbar } from "@/components/drawing-board/persistence/board-toolbar";
import { SizingReport } from "@/components/drawing-board/report/sizing-report";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { mayDo, schematicView } from "@/lib/persistence/schematic-view";
import { unitPrefsFrom } from "@/lib/units/display";

export const metadata: Metadata = { title: "Drawing board" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string; schematicId: string }> };

export default async function BoardPage({ params }: Params) {
  const { projectId, schematicId } = await params;
  const checked = await pageAccess(() => requireSchematicAccess(schematicId, "read"));
  if (!checked.ok) return <NotAllowed message={checked.message} />;
  const access = checked.value;
  if (access.schematic.projectId !== projectId) redirect(`/projects/${access.schematic.projectId}/schematics/${schematicId}`);
  const [view, canSize] = await Promise.all([schematicView(access), mayDo(schematicId, "size")]);
  if (!view) notFound();

  return (
    <BoardSession view={view} role={access.role} canSize={canSize} units={unitPrefsFrom(access.user.preferences)}>
      <DrawingBoard toolbarSlot={<BoardToolbar />} reportSlot={<SizingReport />} canvasSlot={<CanvasOverlay />} />
    </BoardSession>
  );
}
