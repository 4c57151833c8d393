import { parseSchematic, type Schematic } from "@/lib/schematic";
import { keep } from "./undo";
import type { Command } from "./types";

/**
 * Replace the whole document as ONE undo step (e.g. "apply suggested sizes").
 * The new document is parsed first, so a bad one never reaches the board.
 */
export const applyDoc: Command<{ doc: Schematic }> = {
  id: "apply-doc",
  label: "Apply changes",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { doc }) {
    const parsed = parseSchematic(doc);
    if (!parsed.ok) return { refused: parsed.issues[0]?.message ?? "Not a valid schematic." };
    return { doc: parsed.doc, selection: keep(state, parsed.doc) };
  },
};
