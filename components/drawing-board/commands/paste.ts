import { z } from "zod";
import { partSchema, pipeSchema } from "@/lib/schematic";
import { insertClipboard } from "./clipboard";
import type { Clipboard, Command } from "./types";

const clipboardSchema = z.object({
  kind: z.literal("loopwright/clipboard"),
  parts: z.array(partSchema),
  pipes: z.array(pipeSchema),
});

/** Validate clipboard JSON from outside (system clipboard, another tab): never trust it unparsed. */
export function parseClipboard(text: string): Clipboard | null {
  try {
    const parsed = clipboardSchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

const STEP = 40;

/** Paste the given (or board) clipboard, offset a little further each time, with new ids. */
export const paste: Command<{ clipboard?: Clipboard } | void> = {
  id: "paste",
  label: "Paste",
  keys: ["Mod+V"],
  recordsHistory: true,
  changesDoc: true,
  perform(state, args) {
    const clip = (args && args.clipboard) || state.clipboard;
    if (!clip || clip.parts.length === 0) return null;
    const n = state.pasteCount + 1;
    return { ...insertClipboard(state.doc, clip, STEP * n, STEP * n), pasteCount: n };
  },
};
