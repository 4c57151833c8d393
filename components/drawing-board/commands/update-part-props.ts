import { partPropsSchemas, type Part } from "@/lib/schematic";
import type { Command } from "./types";

/**
 * Merge a props patch into one part, validated by that part type's schema —
 * bad input is refused here even if a form let it through.
 */
export const updatePartProps: Command<{ id: string; props: Record<string, unknown> }> = {
  id: "update-part-props",
  label: "Change part",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { id, props }) {
    const part = state.doc.parts.find((p) => p.id === id);
    if (!part) return { refused: `There is no part '${id}'.` };
    const parsed = partPropsSchemas[part.type].safeParse({ ...part.props, ...props });
    if (!parsed.success) return { refused: parsed.error.issues[0]?.message ?? "Invalid value." };
    const next = { ...part, props: parsed.data } as Part;
    return { doc: { ...state.doc, parts: state.doc.parts.map((p) => (p.id === id ? next : p)) } };
  },
};
