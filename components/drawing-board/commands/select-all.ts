import type { Command } from "./types";

export const selectAll: Command = {
  id: "select-all",
  label: "Select all",
  keys: ["Mod+A"],
  recordsHistory: false,
  changesDoc: false,
  perform(state) {
    return { selection: { parts: state.doc.parts.map((p) => p.id), pipes: state.doc.pipes.map((p) => p.id) } };
  },
};
