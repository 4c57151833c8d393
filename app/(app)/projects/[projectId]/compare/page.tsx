import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ZodError } from "zod";
import { requireProjectRole } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { UserError, zodIssues } from "@/lib/auth/errors";
import { NotAllowed } from "@/components/ui/not-allowed";
import { ComparePicker } from "@/components/compare/compare-picker";
import { CompareView } from "@/components/compare/compare-view";
import { getProjectHead } from "@/db/queries/project-admin";
import { listProjectSchematics } from "@/db/queries/schematics";
import { compareDesigns, type ComparisonView } from "@/lib/compare/compare";
import { designGroups } from "@/lib/compare/options";
import { compareHref } from "@/lib/compare/refs";
import { unitPrefsFrom } from "@/lib/units/display";

export const metadata: Metadata = { title: "Side by side" };
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ projectId: string }>; searchParams: Promise<{ a?: string | string[]; b?: string | string[] }> };
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v) ?? null;

/** Side by side: ?a={ref}&b={ref} compares two designs (lib/compare, as GET /api/v1/compare); without both, the picker. */
export default async function ComparePage({ params, searchParams }: Params) {
  const { projectId } = await params;
  const q = await searchParams;
  const [a, b] = [first(q.a), first(q.b)];
  const access = await pageAccess(() => requireProjectRole(projectId, "variant.compare"));
  if (!access.ok) return <NotAllowed message={access.message} />;
  const { user, role } = access.value;
  const [project, list] = await Promise.all([getProjectHead(projectId), listProjectSchematics(projectId, user.id, role)]);
  if (!project) notFound();

  let view: ComparisonView | null = null;
  let problem: string | null = null;
  if (a && b) {
    // unreadable or missing designs: the 404 page, as for any id the caller may not see
    const compared = await pageAccess(() => compareDesigns({ a, b }).catch((e) => {
      if (e instanceof ZodError) return zodIssues(e).map((i) => `${i.path.toUpperCase()}: ${i.message}`).join(" ");
      if (e instanceof UserError) return e.message;
      throw e;
    }));
    if (!compared.ok) problem = compared.message;
    else if (typeof compared.value === "string") problem = compared.value;
    else view = compared.value;
  }

  return (
    <main className="mx-auto max-w-7xl px-3 py-6 sm:px-4">
      <p className="text-sm text-ink-faint">
        <Link href="/projects" className="hover:text-copper-600">Projects</Link> / <Link href={`/projects/${projectId}`} className="hover:text-copper-600">{project.name}</Link> / Side by side
      </p>
      <div className="mt-1 flex flex-wrap items-end justify-between gap-2">
        <h1 className="text-2xl font-semibold">Side by side</h1>
        {view && <Link href={compareHref(projectId, b, a)} className="text-sm text-copper-700 underline hover:text-copper-600" data-testid="compare-swap">Swap A and B</Link>}
      </div>
      <details className="mt-3 rounded-lg border border-ink/10 bg-white p-3" open={!view}>
        <summary className="cursor-pointer text-sm font-medium text-ink-soft">{view ? "Compare something else" : "Choose two designs: any schematic's working draft or saved revision"}</summary>
        <div className="mt-3"><ComparePicker action={`/projects/${projectId}/compare`} groups={designGroups(list)} a={a} b={b} /></div>
      </details>
      {problem && <p role="alert" className="mt-4 rounded-md border border-fault/30 bg-fault/5 px-3 py-2 text-sm text-fault" data-testid="compare-problem">{problem}</p>}
      {view && <div className="mt-4"><CompareView comparison={view.comparison} documents={view.documents} prefs={unitPrefsFrom(user.preferences)} /></div>}
    </main>
  );
}
