import { findPipeSize } from "@/lib/hydraulics/pipes/catalogue";
import type { Command } from "./types";

/**
 * "Apply proposed sizes": every pipe the whole-network proposal changes gets
 * its new size, as ONE undo step. Sizes are checked against each pipe's own
 * material catalogue, so a stale or foreign proposal cannot break the drawing;
 * an inner-diameter/roughness override belongs to the old size and goes with it
 * (the optimiser never changes such a pipe, so this only matters for hand edits).
 */
export const applySizeProposal: Command<{ sizes: Record<string, string> }> = {
  id: "apply-size-proposal",
  label: "Apply proposed sizes",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { sizes }) {
    let changed = 0;
    for (const p of state.doc.pipes) {
      const size = sizes[p.id];
      if (size === undefined || size === p.size) continue;
      if (!findPipeSize(p.material, size)) return { refused: `Pipe ${p.id}: no ${p.material} size "${size}" — size it again.` };
      changed++;
    }
    if (changed === 0) return { refused: "The proposal changes no pipe." };
    const pipes = state.doc.pipes.map((p) => {
      const size = sizes[p.id];
      if (size === undefined || size === p.size) return p;
      const { innerDiameterMm: _d, roughnessMm: _e, ...rest } = p;
      return { ...rest, size };
    });
    return { doc: { ...state.doc, pipes } };
  },
};
