/**
 * The command registry: toolbar buttons, keyboard shortcuts and the help
 * overlay all go through `commands[id]`, dispatched by the board store.
 */
import { addPart } from "./add-part";
import { applyDoc } from "./apply-doc";
import { applySizeProposal } from "./apply-size-proposal";
import { connectPipe } from "./connect-pipe";
import { copy } from "./copy";
import { deleteSelection } from "./delete-selection";
import { duplicateSelection } from "./duplicate-selection";
import { insertOnPipe } from "./insert-on-pipe";
import { moveParts } from "./move-parts";
import { flipSelection, rotateSelection } from "./orient-selection";
import { paste } from "./paste";
import { redo } from "./redo";
import { selectAll } from "./select-all";
import { tidySelection } from "./tidy-selection";
import { undo } from "./undo";
import { updatePart } from "./update-part";
import { updatePartProps } from "./update-part-props";
import { updatePipe } from "./update-pipe";
import { updateDesign } from "./update-design";
import type { Command } from "./types";

export const commands = {
  "add-part": addPart,
  "insert-on-pipe": insertOnPipe,
  "move-parts": moveParts,
  "delete-selection": deleteSelection,
  "duplicate-selection": duplicateSelection,
  copy,
  paste,
  "connect-pipe": connectPipe,
  "update-part-props": updatePartProps,
  "update-part": updatePart,
  "update-pipe": updatePipe,
  "update-design": updateDesign,
  "tidy-selection": tidySelection,
  "rotate-selection": rotateSelection,
  "flip-selection": flipSelection,
  undo,
  redo,
  "select-all": selectAll,
  "apply-doc": applyDoc,
  "apply-size-proposal": applySizeProposal,
} as const;

export type CommandId = keyof typeof commands;
export type CommandArgs<K extends CommandId> = (typeof commands)[K] extends Command<infer A> ? A : never;
export { connectionProblem } from "./connection";
export { freeSpotNear } from "./free-spot";
export { inlinePorts } from "./insert-on-pipe";
export { parseClipboard } from "./paste";
export type { Command, Clipboard, Selection, BoardState, DispatchResult } from "./types";
