import { pipeSchema } from "@/lib/schematic";
import { connectionProblem } from "./connection";
import { idGenerator, PIPE_PREFIX } from "./ids";
import type { Command } from "./types";

/**
 * Join two ports with a new pipe. Defaults: copper 22, 1 m — the designer types
 * the real length in details; Size it suggests the size.
 */
export const connectPipe: Command<{ from: string; to: string }> = {
  id: "connect-pipe",
  label: "Connect pipe",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { from, to }) {
    const problem = connectionProblem(state.doc, from, to);
    if (problem) return { refused: problem };
    const id = idGenerator(state.doc)(PIPE_PREFIX);
    const pipe = pipeSchema.parse({ id, from, to, material: "copper", size: "22", lengthM: 1 });
    return {
      doc: { ...state.doc, pipes: [...state.doc.pipes, pipe] },
      selection: { parts: [], pipes: [id] },
      hint: null,
    };
  },
};
