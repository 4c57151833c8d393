import { designConditionIssues } from "@/lib/hydraulics/design-conditions";
import type { Design, Fluid } from "@/lib/schematic";
import type { Command } from "./types";

/**
 * Change the schematic's design conditions (and fluid) as one undo step.
 * Refused, with the reason, when sizing could not use them (return not below
 * flow, glycol outside its tables, a static height the safety valve cannot
 * take…) — even if a form let it through.
 */
export const updateDesign: Command<{ design?: Partial<Design>; fluid?: Fluid }> = {
  id: "update-design",
  label: "Change design conditions",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { design, fluid }) {
    const next = { design: { ...state.doc.design, ...design }, fluid: fluid ?? state.doc.fluid };
    const issues = designConditionIssues(next.design, next.fluid);
    if (issues.length > 0) return { refused: issues[0]!.message };
    return { doc: { ...state.doc, design: next.design, fluid: next.fluid } };
  },
};
