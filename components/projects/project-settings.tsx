"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { updateProjectAction } from "@/components/projects/actions";
import { Button } from "@/components/ui/button";
import { ProjectForm, type ProjectFields } from "./project-form";

/** Owner and designer: rename the project, change client, site or design defaults; archive it, or restore it. */
export function ProjectSettings({ projectId, initial, archived }: { projectId: string; initial: ProjectFields; archived: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const setArchived = async (value: boolean) => {
    const r = await updateProjectAction({ projectId, change: { archived: value } });
    if (!r.ok) return setError(r.error);
    setError(null);
    router.refresh();
  };
  if (editing) {
    return (
      <div className="mt-2 w-full">
        <ProjectForm initial={initial} submitLabel="Save project" onCancel={() => setEditing(false)} onSubmit={async (v) => {
          const r = await updateProjectAction({ projectId, change: v });
          if (r.ok) {
            setEditing(false);
            router.refresh();
          }
          return r;
        }} />
      </div>
    );
  }
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => setEditing(true)} data-testid="edit-project">Edit project</Button>
      <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => setArchived(!archived)} data-testid="archive-project">
        {archived ? "Restore from archive" : "Archive"}
      </Button>
      {error && <span role="alert" className="text-xs text-fault">{error}</span>}
    </span>
  );
}
