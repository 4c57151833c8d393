import { keep } from "./undo";
import type { Command } from "./types";

export const redo: Command = {
  id: "redo",
  label: "Redo",
  keys: ["Mod+Shift+Z", "Mod+Y"],
  recordsHistory: false,
  changesDoc: true,
  perform(state) {
    const [next, ...rest] = state.future;
    if (!next) return null;
    return { doc: next, past: [...state.past, state.doc], future: rest, selection: keep(state, next) };
  },
};
