import { pipeSchema, type Pipe } from "@/lib/schematic";
import type { Command } from "./types";

type PipePatch = Partial<Omit<Pipe, "id" | "from" | "to">>;

/** Change a pipe's material, size, length, fittings or overrides; validated by the pipe schema. */
export const updatePipe: Command<{ id: string; patch: PipePatch }> = {
  id: "update-pipe",
  label: "Change pipe",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { id, patch }) {
    const pipe = state.doc.pipes.find((p) => p.id === id);
    if (!pipe) return { refused: `There is no pipe '${id}'.` };
    const merged: Record<string, unknown> = { ...pipe, ...patch, id, from: pipe.from, to: pipe.to };
    // undefined in a patch means "remove the override"
    for (const k of Object.keys(merged)) if (merged[k] === undefined) delete merged[k];
    const parsed = pipeSchema.safeParse(merged);
    if (!parsed.success) return { refused: parsed.error.issues[0]?.message ?? "Invalid value." };
    return { doc: { ...state.doc, pipes: state.doc.pipes.map((p) => (p.id === id ? parsed.data : p)) } };
  },
};
