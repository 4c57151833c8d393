import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { pageAccess } from "@/lib/auth/page-guard";
import { handoverView } from "@/lib/handover/handover-view";
import { HandoverScreen } from "@/components/handover/handover-screen";
import { NotAllowed } from "@/components/ui/not-allowed";

export const metadata: Metadata = { title: "Handover pack" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string; schematicId: string }>; searchParams: Promise<{ rev?: string }> };

/** The handover pack of a revision: report (PDF, print view), materials list with prices, and Send. */
export default async function HandoverPage({ params, searchParams }: Params) {
  const { projectId, schematicId } = await params;
  const { rev } = await searchParams;
  const view = await pageAccess(() => handoverView(schematicId, rev ?? null));
  if (!view.ok) return <NotAllowed message={view.message} />;
  if (view.value.projectId !== projectId) redirect(`/projects/${view.value.projectId}/schematics/${schematicId}/handover`);
  return <HandoverScreen view={view.value} />;
}
