"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { createSchematicAction } from "@/components/projects/actions";
import { Button } from "@/components/ui/button";

/** Name a new, empty team schematic and open it on the drawing board. */
export function NewSchematicForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    if (!name.trim()) return setError("Give the schematic a name.");
    setBusy(true);
    const r = await createSchematicAction({ projectId, name });
    if (!r.ok) {
      setBusy(false);
      return setError(r.error);
    }
    router.push(`/projects/${projectId}/schematics/${r.data.id}`);
  };
  return (
    <form onSubmit={submit} className="flex flex-wrap items-center gap-2" aria-label="Create schematic">
      <label htmlFor="new-schematic" className="sr-only">New schematic name</label>
      <input id="new-schematic" value={name} onChange={(e) => setName(e.target.value)} maxLength={160} placeholder="New schematic name"
        aria-invalid={error ? true : undefined}
        className="w-56 rounded-md border border-ink/15 bg-white px-3 py-1.5 text-sm focus:outline-2 focus:outline-copper-500" />
      <Button type="submit" className="px-3 py-1.5" disabled={busy}>{busy ? "Creating…" : "Create schematic"}</Button>
      {error && <p role="alert" className="w-full text-xs text-fault">{error}</p>}
    </form>
  );
}
