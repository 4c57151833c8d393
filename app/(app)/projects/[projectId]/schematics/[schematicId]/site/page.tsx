import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { AuthError } from "@/lib/auth/errors";
import { pageAccess } from "@/lib/auth/page-guard";
import { siteSheet } from "@/lib/site/site-view";
import { SiteSheetApp } from "@/components/site-sheet/site-sheet-app";
import { NotAllowed } from "@/components/ui/not-allowed";

export const metadata: Metadata = { title: "Site sheet" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string; schematicId: string }> };

/** The installer's phone view of the issued revision (works offline once visited). */
export default async function SitePage({ params }: Params) {
  const { projectId, schematicId } = await params;
  const checked = await pageAccess(() => requireSchematicAccess(schematicId, "read"));
  if (!checked.ok) return <NotAllowed message={checked.message} />;
  if (checked.value.schematic.projectId !== projectId) redirect(`/projects/${checked.value.schematic.projectId}/schematics/${schematicId}/site`);
  try {
    return <SiteSheetApp initial={await siteSheet(schematicId)} />;
  } catch (e) {
    if (e instanceof AuthError) return <NotAllowed message={e.message} />;
    throw e;
  }
}
