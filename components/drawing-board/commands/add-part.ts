import { partPropsSchemas, partRegistry, partSchema, type PartType } from "@/lib/schematic";
import { idGenerator, idPrefix } from "./ids";
import type { Command } from "./types";

/** Drop a new part with its schema defaults at (x, y); it becomes the selection. */
export const addPart: Command<{ type: PartType; x: number; y: number }> = {
  id: "add-part",
  label: "Add part",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { type, x, y }) {
    if (!(type in partRegistry)) return { refused: `Unknown part type '${type}'.` };
    const id = idGenerator(state.doc)(idPrefix[type]);
    const part = partSchema.parse({ id, type, x: Math.round(x), y: Math.round(y), props: partPropsSchemas[type].parse({}) });
    return {
      doc: { ...state.doc, parts: [...state.doc.parts, part] },
      selection: { parts: [id], pipes: [] },
    };
  },
};
