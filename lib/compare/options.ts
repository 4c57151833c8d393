/**
 * What the compare picker offers: each schematic the caller can read (its working draft)
 * and its saved revisions, grouped by schematic. Pure and client-safe.
 */
import { refText } from "./refs";

export interface ListedSchematic {
  id: string; name: string; kind: "team" | "practice"; ownerName: string | null;
  revisions: { id: string; number: number; status: string }[];
}
export interface DesignGroup { label: string; options: { ref: string; label: string }[] }

const statusWords: Record<string, string> = { draft: "draft", "in-review": "in review", approved: "approved", issued: "issued" };

export function designGroups(list: ListedSchematic[]): DesignGroup[] {
  return list.map((s) => ({
    label: s.kind === "practice" ? `${s.name} (practice${s.ownerName ? `, ${s.ownerName}` : ""})` : s.name,
    options: [
      { ref: refText({ kind: "schematic", id: s.id }), label: `${s.name} — working draft` },
      ...s.revisions.map((r) => ({ ref: refText({ kind: "revision", id: r.id }), label: `${s.name} — Rev ${r.number} (${statusWords[r.status] ?? r.status})` })),
    ],
  }));
}
