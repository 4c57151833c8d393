import { copySelection, insertClipboard } from "./clipboard";
import type { Command } from "./types";

/** Copy + paste in one step, without touching the clipboard. */
export const duplicateSelection: Command = {
  id: "duplicate-selection",
  label: "Duplicate",
  keys: ["Mod+D"],
  recordsHistory: true,
  changesDoc: true,
  perform(state) {
    const clip = copySelection(state);
    return clip ? insertClipboard(state.doc, clip, 40, 40) : null;
  },
};
