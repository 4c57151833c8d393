import { splitPortRef } from "@/lib/schematic";
import type { Command } from "./types";

/** Delete the selected parts and pipes, and every pipe left without a part at one end. */
export const deleteSelection: Command = {
  id: "delete-selection",
  label: "Delete",
  keys: ["Delete", "Backspace"],
  recordsHistory: true,
  changesDoc: true,
  perform(state) {
    const parts = new Set(state.selection.parts);
    const pipes = new Set(state.selection.pipes);
    if (parts.size === 0 && pipes.size === 0) return null;
    const doc = state.doc;
    const keepPipe = (p: (typeof doc.pipes)[number]) =>
      !pipes.has(p.id) && !parts.has(splitPortRef(p.from).partId) && !parts.has(splitPortRef(p.to).partId);
    return {
      doc: { ...doc, parts: doc.parts.filter((p) => !parts.has(p.id)), pipes: doc.pipes.filter(keepPipe) },
      selection: { parts: [], pipes: [] },
    };
  },
};
