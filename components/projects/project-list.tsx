"use client";

import Link from "next/link";
import useSWR from "swr";
import type { ProjectSummary } from "@/db/queries/projects";
import { fetchJson } from "@/lib/fetch-json";
import { CopyDemoProject, NewProject } from "./new-project";
import { StatusBadge } from "./status-badge";

/** The caller's projects; archived ones folded away; an empty firm is offered a first project or the demo. */
export function ProjectList() {
  const { data, error, isLoading } = useSWR<{ projects: ProjectSummary[] }>("/api/v1/projects", fetchJson);
  if (error) return <p role="alert" className="mt-6 text-fault">Could not load projects: {(error as Error).message}</p>;
  if (isLoading || !data) return <p className="mt-6 text-ink-faint">Loading projects…</p>;
  if (data.projects.length === 0) {
    return (
      <section className="mt-6 rounded-lg border border-dashed border-copper-300 bg-white p-6" data-testid="projects-empty">
        <h2 className="text-lg font-semibold">No projects yet</h2>
        <p className="mt-1 max-w-prose text-sm text-ink-soft">
          Start your first job with its client, site and design conditions, or copy the demo house (an invented two-zone heat-pump job
          with a bypass-only and a buffer variant) to try the drawing board and sizing first.
        </p>
        <div className="mt-4 flex flex-wrap items-start gap-3"><NewProject /><CopyDemoProject /></div>
      </section>
    );
  }
  const active = data.projects.filter((p) => !p.archivedAt);
  const archived = data.projects.filter((p) => p.archivedAt);
  return (
    <>
      <div className="mt-4 flex flex-wrap items-start gap-3"><NewProject /></div>
      {active.length === 0 && <p className="mt-6 text-sm text-ink-soft">Every project is archived.</p>}
      <Cards projects={active} testId="project-list" />
      {archived.length > 0 && (
        <details className="mt-8" data-testid="archived-projects">
          <summary className="cursor-pointer text-sm text-ink-soft hover:text-ink">Archived ({archived.length})</summary>
          <Cards projects={archived} testId="archived-list" />
        </details>
      )}
    </>
  );
}

function Cards({ projects, testId }: { projects: ProjectSummary[]; testId: string }) {
  return (
    <ul className="mt-6 grid gap-3 sm:grid-cols-2" data-testid={testId}>
      {projects.map((p) => (
        <li key={p.id}>
          <Link href={`/projects/${p.id}`} className={`block rounded-lg border border-ink/10 bg-white p-4 shadow-sm transition hover:border-copper-300 ${p.archivedAt ? "opacity-75" : ""}`}>
            <div className="flex items-start justify-between gap-2">
              <h2 className="font-semibold">{p.name}</h2>
              {p.archivedAt ? <span className="rounded-full bg-paper-dark px-2 py-0.5 text-xs text-ink-soft">Archived</span> : p.latestStatus && <StatusBadge status={p.latestStatus} />}
            </div>
            <p className="mt-1 text-sm text-ink-soft">{p.client}</p>
            <p className="text-sm text-ink-faint">{p.site}</p>
            <p className="mt-3 text-xs text-ink-faint">
              <span className="num">{p.schematicCount}</span> schematic{p.schematicCount === 1 ? "" : "s"}
              {p.role && <> · you are <span className="font-medium text-ink-soft">{p.role}</span></>}
            </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
