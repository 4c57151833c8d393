import type { Command } from "./types";

export const undo: Command = {
  id: "undo",
  label: "Undo",
  keys: ["Mod+Z"],
  recordsHistory: false,
  changesDoc: true,
  perform(state) {
    const prev = state.past[state.past.length - 1];
    if (!prev) return null;
    return { doc: prev, past: state.past.slice(0, -1), future: [state.doc, ...state.future], selection: keep(state, prev) };
  },
};

/** Drop selected ids that no longer exist, so details never show a ghost. */
export function keep(state: { selection: { parts: string[]; pipes: string[] } }, doc: { parts: { id: string }[]; pipes: { id: string }[] }) {
  const parts = new Set(doc.parts.map((p) => p.id));
  const pipes = new Set(doc.pipes.map((p) => p.id));
  return { parts: state.selection.parts.filter((id) => parts.has(id)), pipes: state.selection.pipes.filter((id) => pipes.has(id)) };
}
