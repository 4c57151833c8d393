import { copySelection } from "./clipboard";
import type { Command } from "./types";

/** Copy the selection (parts + internal pipes) to the board clipboard; the canvas mirrors it to the system clipboard. */
export const copy: Command = {
  id: "copy",
  label: "Copy",
  keys: ["Mod+C"],
  recordsHistory: false,
  changesDoc: false,
  perform(state) {
    const clipboard = copySelection(state);
    return clipboard ? { clipboard, pasteCount: 0 } : null;
  },
};
