/**
 * How the differences are marked on the two drawings: added ones on the side that has
 * them (b), removed ones on the side that lost them (a), changed ones on both, with the
 * changed fields as the tooltip. Colours are our own, chosen apart from the red and blue
 * of flow and return pipes. Pure.
 */
import type { Mark } from "@/components/drawing-board/export/drawing-body";
import type { DocDiff } from "@/lib/schematic/doc-diff";

export const markColours = { added: "#2f7d4f", removed: "#7b3fa0", changed: "#d08a1a" } as const;
export type MarkKind = keyof typeof markColours;

export interface SideMarks { marks: Map<string, Mark>; changedIds: Set<string>; removed: { ids: Set<string>; marks: Map<string, Mark> } }

const mark = (kind: MarkKind, note: string): Mark => ({ kind, colour: markColours[kind], note });

export function sideMarks(changes: Pick<DocDiff, "added" | "removed" | "changed">, side: "a" | "b"): SideMarks {
  const marks = new Map<string, Mark>();
  const lonely = side === "a" ? changes.removed : changes.added;
  for (const id of lonely) marks.set(id, mark(side === "a" ? "removed" : "added", side === "a" ? `${id}: not in B` : `${id}: new in B`));
  for (const c of changes.changed) marks.set(c.id, mark("changed", `${c.id} changed: ${c.fields.join(", ")}`));
  // B draws what it lost faintly where A had it: removed "on the side that lost them" too
  const removed = new Set(side === "b" ? changes.removed : []);
  const removedMarks = new Map([...removed].map((id) => [id, mark("removed", `${id}: removed (was in A)`)]));
  return { marks, changedIds: new Set(marks.keys()), removed: { ids: removed, marks: removedMarks } };
}
