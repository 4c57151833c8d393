"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { newVariantAction } from "@/components/projects/actions";
import { Button } from "@/components/ui/button";

/** Copies the stored draft into a new variant (private practice copy for trainees) and opens it. */
export function NewVariantButton({ schematicId, label }: { schematicId: string; label: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const go = async () => {
    setBusy(true);
    const r = await newVariantAction({ schematicId });
    if (!r.ok) {
      setBusy(false);
      return setError(r.error);
    }
    router.push(`/projects/${r.data.projectId}/schematics/${r.data.id}`);
  };
  return (
    <>
      <Button variant="secondary" className="px-3 py-1.5" onClick={go} disabled={busy}>{busy ? "Copying…" : label}</Button>
      {error && <span role="alert" className="text-xs text-fault">{error}</span>}
    </>
  );
}
