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
import { LiveBoard } from "@/components/review/live-board";
import { LiveSessionSync } from "@/components/review/live-session-sync";
import { PhoneReview } from "@/components/review/phone-review";
import { PresenceDots } from "@/components/review/presence-dots";
import { ReviewProvider } from "@/components/review/review-context";
import { ReviewDock } from "@/components/review/review-dock";
import { ThreadMarkers } from "@/components/review/thread-markers";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { getProjectHead } from "@/db/queries/project-admin";
import { mayDo, schematicView } from "@/lib/persistence/schematic-view";
import { unitPrefsFrom } from "@/lib/units/display";

export const metadata: Metadata = { title: "Drawing board" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string; schematicId: string }>; searchParams: Promise<{ rev?: string; thread?: string }> };

/**
 * The board; `?rev=<id>` opens a saved revision, `?rev=draft` the working draft, neither the
 * role's default; `&thread=<id>` opens that review thread (e-mail links land here).
 */
export default async function BoardPage({ params, searchParams }: Params) {
  const { projectId, schematicId } = await params;
  const { rev, thread } = await searchParams;
  const checked = await pageAccess(() => requireSchematicAccess(schematicId, "read"));
  if (!checked.ok) return <NotAllowed message={checked.message} />;
  const access = checked.value;
  if (access.schematic.projectId !== projectId) redirect(`/projects/${access.schematic.projectId}/schematics/${schematicId}`);
  const [view, canSize, project] = await Promise.all([schematicView(access, rev ?? "default"), mayDo(schematicId, "size"), getProjectHead(projectId)]);
  if (!view || !project) notFound();
  const opened = view.viewing.kind === "revision" ? view.viewing.revision.id : "draft";
  const viewing = view.viewing.kind === "revision"
    ? { id: view.viewing.revision.id, number: view.viewing.revision.number, status: view.viewing.revision.status } : null;

  return (
    <LiveBoard key={opened} schematicId={schematicId}>
      <ReviewProvider schematicId={schematicId} userId={access.user.id} role={access.role} viewing={viewing} initialThread={thread ?? null}
        schematic={{ kind: access.schematic.kind, ownerId: access.schematic.ownerId }}>
        <BoardSession view={view} projectName={project.name} role={access.role} canSize={canSize && view.viewing.kind === "draft"}
          units={unitPrefsFrom(access.user.preferences)}>
          <DrawingBoard toolbarSlot={<><PresenceDots /><LiveSessionSync /><BoardToolbar /></>} reportSlot={<SizingReport />}
            canvasSlot={<><CanvasOverlay /><ThreadMarkers /><PhoneReview /></>}
            barSlot={<><ViewingBanner /><ResultsBar /></>} dockSlot={<><FindingsDock /><ReviewDock /></>} />
        </BoardSession>
      </ReviewProvider>
    </LiveBoard>
  );
}
