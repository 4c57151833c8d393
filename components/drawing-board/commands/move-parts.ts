import type { Command } from "./types";

/** Commit the end of a drag: every moved part in one undo step. */
export const moveParts: Command<{ moves: { id: string; x: number; y: number }[] }> = {
  id: "move-parts",
  label: "Move parts",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { moves }) {
    const to = new Map(moves.map((m) => [m.id, m]));
    let changed = false;
    const parts = state.doc.parts.map((p) => {
      const m = to.get(p.id);
      if (!m) return p;
      const x = Math.round(m.x);
      const y = Math.round(m.y);
      if (x === p.x && y === p.y) return p;
      changed = true;
      return { ...p, x, y };
    });
    return changed ? { doc: { ...state.doc, parts } } : null;
  },
};
