/**
 * Findings for the list beside the canvas: errors first, then warnings, then
 * notes. Per-part markers come from the store's `findings` index (store.ts).
 */
import type { Finding, Results, Severity } from "@/lib/schematic";

const rank: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

export function sortedFindings(results: Results | null): Finding[] {
  if (!results) return [];
  return [...results.findings].sort((a, b) => rank[a.severity] - rank[b.severity]);
}

export const severityStyle: Record<Severity, { label: string; className: string; color: string }> = {
  error: { label: "Error", className: "text-fault", color: "#b42318" },
  warning: { label: "Warning", className: "text-warn", color: "#b7791f" },
  info: { label: "Note", className: "text-ink-soft", color: "#4a453e" },
};
