"use client";

import type { Results } from "@/lib/schematic";

/** Above the report when typical values were assumed: what the ≈ mark means, and which parts. */
export function AssumptionsNote({ results }: { results: Results }) {
  const parts = [...new Set((results.assumptions ?? []).map((a) => a.part))];
  if (parts.length === 0) return null;
  return (
    <p className="rounded border border-warn/30 bg-warn/5 px-3 py-2 text-sm text-ink-soft" data-testid="assumptions-note">
      <span className="font-medium text-warn">≈ Typical values assumed</span> for {parts.join(", ")}, where the drawing gives no Kv or water
      content. Numbers marked ≈ rest on them; open a number to see which, and type the makers&apos; values to replace them.
    </p>
  );
}
