/**
 * What leaving a part's field empty does, in the form's words: from the
 * engine's table of typical values (lib/hydraulics/typical) where it has a
 * row, else from the "(null: …)" note in the field's schema description.
 */
import { typicalFor } from "@/lib/hydraulics/typical/typical-values";
import type { PartType } from "@/lib/schematic";

export function emptyText(type: PartType, field: string, nullHint: string): string {
  const t = typicalFor(type, field);
  if (t?.empty === "typical") return `Empty: typical value assumed — ${t.basis} (${t.source}).`;
  if (t?.empty === "not-counted") return `Empty: not counted — ${t.basis}.`;
  if (t?.empty === "computed") return `Empty: computed by sizing — ${t.basis}.`;
  if (nullHint === "computed by sizing") return "Empty: computed by sizing.";
  return nullHint ? `Empty: ${nullHint}.` : "";
}
