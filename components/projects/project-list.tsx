"use client";

import Link from "next/link";
import useSWR from "swr";
import type { ProjectSummary } from "@/db/queries/projects";
import { fetchJson } from "@/lib/fetch-json";
import { StatusBadge } from "./status-badge";

export function ProjectList() {
  const { data, error, isLoading } = useSWR<{ projects: ProjectSummary[] }>("/api/v1/projects", fetchJson);
  if (error) return <p role="alert" className="mt-6 text-fault">Could not load projects: {(error as Error).message}</p>;
  if (isLoading || !data) return <p className="mt-6 text-ink-faint">Loading projects…</p>;
  if (data.projects.length === 0) return <p className="mt-6 text-ink-soft">No projects yet.</p>;
  return (
    <ul className="mt-6 grid gap-3 sm:grid-cols-2" data-testid="project-list">
      {data.projects.map((p) => (
        <li key={p.id}>
          <Link href={`/projects/${p.id}`} className="block rounded-lg border border-ink/10 bg-white p-4 shadow-sm transition hover:border-copper-300">
            <div className="flex items-start justify-between gap-2">
              <h2 className="font-semibold">{p.name}</h2>
              {p.archivedAt ? <span className="rounded bg-ink/5 px-2 py-0.5 text-xs text-ink-soft">archived</span>
                : p.latestStatus && <StatusBadge status={p.latestStatus} />}
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
