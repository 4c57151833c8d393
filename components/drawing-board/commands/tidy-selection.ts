import { layeredLayout } from "./tidy-layout";
import type { Command } from "./types";

/** Lay out the selected parts (all parts when nothing is selected) in tidy columns. */
export const tidySelection: Command = {
  id: "tidy-selection",
  label: "Tidy layout",
  keys: ["T"],
  recordsHistory: true,
  changesDoc: true,
  perform(state) {
    const ids = new Set(state.selection.parts.length > 0 ? state.selection.parts : state.doc.parts.map((p) => p.id));
    if (ids.size === 0) return null;
    const at = layeredLayout(state.doc, ids);
    const parts = state.doc.parts.map((p) => {
      const to = at.get(p.id);
      return to && (to.x !== p.x || to.y !== p.y) ? { ...p, x: to.x, y: to.y } : p;
    });
    return { doc: { ...state.doc, parts } };
  },
};
