/**
 * Findings for the panel beside the canvas: grouped by check (the finding's
 * code), errors first, each group with its count and its items. Per-part
 * markers come from the store's `findings` index (store.ts).
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

/** Our words for the checks seen most; any other code reads as itself ("pump.curve-short" → "Pump curve short"). */
const checkTitles: Record<string, string> = {
  "pipe.velocity-high": "Pipes too fast",
  "pipe.gradient-high": "Pipe gradient above target",
  "pipe.no-flow": "Pipes with no flow",
  "pipe.no-size": "No catalogue size fits",
  "pump.head-low": "Pump short of head",
  "heat-source.min-flow": "Heat source below its minimum flow",
  "emitter.undersized": "Emitters short of their heat load",
  "valve.shut": "Valves drawn shut",
  "part.unconnected": "Parts not connected",
  "part.open-port": "Ports left open",
  "heat-source.reversed": "Heat source backwards",
  "pump.reversed": "Pump drawn backwards",
  "load.reversed": "Emitters piped backwards",
};

export function checkTitle(code: string): string {
  const known = checkTitles[code];
  if (known) return known;
  const words = code.replace(/[.-]/g, " ");
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export interface FindingGroup {
  code: string;
  title: string;
  /** The worst severity among its items. */
  severity: Severity;
  items: Finding[];
}

/** One group per check, worst first, then the biggest groups; items keep the engine's order. */
export function groupFindings(findings: readonly Finding[]): FindingGroup[] {
  const groups = new Map<string, FindingGroup>();
  for (const f of findings) {
    let g = groups.get(f.code);
    if (!g) groups.set(f.code, (g = { code: f.code, title: checkTitle(f.code), severity: f.severity, items: [] }));
    g.items.push(f);
    if (rank[f.severity] < rank[g.severity]) g.severity = f.severity;
  }
  return [...groups.values()].sort((a, b) => rank[a.severity] - rank[b.severity] || b.items.length - a.items.length || a.code.localeCompare(b.code));
}
