import { partSchema, type Part } from "@/lib/schematic";
import type { Command } from "./types";

/** Label and layout fields (rotation, flipX) of a part; props go through update-part-props. */
export const updatePart: Command<{ id: string; patch: { label?: string; rotation?: number; flipX?: boolean } }> = {
  id: "update-part",
  label: "Change part",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { id, patch }) {
    const part = state.doc.parts.find((p) => p.id === id);
    if (!part) return { refused: `There is no part '${id}'.` };
    const parsed = partSchema.safeParse({ ...part, ...patch });
    if (!parsed.success) return { refused: parsed.error.issues[0]?.message ?? "Invalid value." };
    const next: Part = parsed.data;
    return { doc: { ...state.doc, parts: state.doc.parts.map((p) => (p.id === id ? next : p)) } };
  },
};
