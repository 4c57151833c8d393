import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { can, requireProjectRole } from "@/lib/auth/authorize";
import { pageAccess } from "@/lib/auth/page-guard";
import { NotAllowed } from "@/components/ui/not-allowed";
import { getProjectHead } from "@/db/queries/project-admin";
import { listProjectSchematics } from "@/db/queries/schematics";
import { NewSchematicForm } from "@/components/projects/new-schematic-form";
import { ProjectSettings } from "@/components/projects/project-settings";
import { readDesignDefaults } from "@/lib/projects/design-defaults";
import { SchematicCard } from "@/components/projects/schematic-card";
import { CompareTicks } from "@/components/compare/compare-ticks";
import { ProjectDefaultsForm } from "@/components/design-conditions/project-defaults-form";
import { projectDefaultsFrom } from "@/lib/schematic/project-defaults";
import { getProjectDesignConditions } from "@/db/queries/project-design";

export const metadata: Metadata = { title: "Project" };
export const dynamic = "force-dynamic";

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const access = await pageAccess(() => requireProjectRole(projectId, "project.read"));
  if (!access.ok) return <NotAllowed message={access.message} />;
  const { user, role } = access.value;
  const [project, schematics, defaults] = await Promise.all([getProjectHead(projectId), listProjectSchematics(projectId, user.id, role), getProjectDesignConditions(projectId)]);
  if (!project) notFound();
  // Variants are listed under the schematic they were made from; orphans stand on their own.
  const ids = new Set(schematics.map((s) => s.id));
  const roots = schematics.filter((s) => !s.variantOf || !ids.has(s.variantOf));
  const variantsOf = (id: string) => schematics.filter((s) => s.variantOf === id);
  const canCreate = can(role, "schematic.edit");
  const canPractice = role === "trainee" ? can(role, "variant.practice") : canCreate;
  const design = readDesignDefaults(project.design);
  const canCompare = can(role, "variant.compare");
  const list = (
    <ul className="mt-4 space-y-4" data-testid="schematic-list">
      {roots.map((s) => (
        <li key={s.id}>
          <SchematicCard projectId={projectId} s={s} canVariant={canPractice} variantLabel={role === "trainee" ? "New practice variant" : "New variant"} canCompare={canCompare} />
          {variantsOf(s.id).length > 0 && (
            <ul className="mt-2 ml-4 space-y-2 border-l-2 border-copper-100 pl-4 sm:ml-6">
              {variantsOf(s.id).map((v) => <li key={v.id}><SchematicCard projectId={projectId} s={v} compact canCompare={canCompare} /></li>)}
            </ul>
          )}
        </li>
      ))}
    </ul>
  );

  return (
    <main className="mx-auto max-w-5xl px-4 py-8">
      <p className="text-sm text-ink-faint"><Link href="/projects" className="hover:text-copper-600">Projects</Link> / {project.name}</p>
      <div className="mt-1 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">{project.name}</h1>
          <p className="mt-1 text-sm text-ink-soft">{project.client}{project.site && <> · <span className="text-ink-faint">{project.site}</span></>}</p>
        </div>
        <p className="text-sm text-ink-soft">
          You are <span className="font-medium text-copper-700">{role}</span> ·{" "}
          <Link href={`/projects/${projectId}/team`} className="text-copper-600 hover:underline">Team</Link>
          {" · "}<Link href={`/projects/${projectId}/rooms`} className="text-copper-600 hover:underline">Rooms</Link>
        </p>
      </div>
      <div className="mt-3 flex flex-wrap items-center justify-between gap-3 text-sm text-ink-soft" data-testid="project-design">
        <span>
          Design: flow <span className="num">{design.flowTemperatureC} °C</span> / return <span className="num">{design.returnTemperatureC} °C</span>,
          outdoor {design.outdoorC === null ? "not set" : <span className="num">{design.outdoorC} °C</span>}{design.heatSource && <> · {design.heatSource}</>}
        </span>
        {can(role, "project.update") && (
          <ProjectSettings projectId={projectId} archived={project.archivedAt !== null}
            initial={{ name: project.name, client: project.client, clientEmail: project.clientEmail, site: project.site, design }} />
        )}
      </div>
      {project.archivedAt && (
        <p role="status" className="mt-3 rounded-md border border-warn/30 bg-warn/5 px-3 py-2 text-sm text-ink-soft" data-testid="archived-banner">
          Archived on {project.archivedAt.slice(0, 10)}: it is kept as it is and listed under Archived on the projects page.
          A project with issued revisions is archived rather than deleted: they are the record of what was built.
        </p>
      )}

      <section className="mt-8" aria-labelledby="schematics-h">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="schematics-h" className="text-lg font-semibold">Schematics <span className="num text-sm font-normal text-ink-faint">{schematics.length}</span></h2>
          {canCreate && <NewSchematicForm projectId={projectId} />}
        </div>
        {roots.length === 0 && <p className="mt-4 text-sm text-ink-soft">No schematics yet.{canCreate ? " Create the first one." : ""}</p>}
        {canCompare && schematics.length > 0 ? <CompareTicks projectId={projectId}>{list}</CompareTicks> : list}
      </section>
      <ProjectDefaultsForm projectId={projectId} initial={projectDefaultsFrom(defaults)} canEdit={can(role, "project.update")} />
    </main>
  );
}
