"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { copyDemoProjectAction, createProjectAction } from "@/components/projects/actions";
import { Button } from "@/components/ui/button";
import { readDesignDefaults } from "@/lib/projects/design-defaults";
import { ProjectForm } from "./project-form";

const blank = { name: "", client: "", clientEmail: "", site: "", design: readDesignDefaults({}) };

/** "New project": opens the project form; a created project opens at once. */
export function NewProject({ startOpen = false }: { startOpen?: boolean }) {
  const router = useRouter();
  const [open, setOpen] = useState(startOpen);
  if (!open) return <Button onClick={() => setOpen(true)} data-testid="new-project">New project</Button>;
  return (
    <div className="w-full">
      <ProjectForm initial={blank} submitLabel="Create project" onCancel={() => setOpen(false)} onSubmit={async (v) => {
        const r = await createProjectAction(v);
        if (r.ok) router.push(`/projects/${r.data.id}`);
        return r;
      }} />
    </div>
  );
}

/** "Copy the demo project": the invented Orchard End house, both variants as drafts, in the caller's firm. */
export function CopyDemoProject() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col">
      <Button variant="secondary" disabled={busy} data-testid="copy-demo" onClick={async () => {
        setBusy(true);
        const r = await copyDemoProjectAction();
        if (r.ok) return router.push(`/projects/${r.data.id}`);
        setBusy(false);
        setError(r.error);
      }}>{busy ? "Copying…" : "Copy the demo project"}</Button>
      {error && <span role="alert" className="mt-1 text-xs text-fault">{error}</span>}
    </span>
  );
}
