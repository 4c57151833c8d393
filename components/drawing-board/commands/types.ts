import type { Part, Pipe, Results, Schematic, Severity } from "@/lib/schematic";
import type { Orientation } from "../parts/orientation";

export interface Selection {
  parts: string[];
  pipes: string[];
}

/** A copied selection: parts plus the pipes running between them. */
export interface Clipboard {
  kind: "loopwright/clipboard";
  parts: Part[];
  pipes: Pipe[];
}

export interface BoardState {
  doc: Schematic;
  selection: Selection;
  past: Schematic[];
  future: Schematic[];
  /** +1 on every document change (commands, undo, redo); autosave watches it. */
  revision: number;
  clipboard: Clipboard | null;
  results: Results | null;
  /** Worst finding severity per part/pipe id, derived from results. */
  findings: Map<string, Severity>;
  /** The document the results were computed for (what "changed since" compares with). */
  resultsDoc: Schematic | null;
  /** A sizing input changed since results were computed (lib/schematic/doc-changes). */
  resultsStale: boolean;
  /** Which results the overlay, report and markers show: a design mode or a scenario (overlay/results-view.ts). */
  resultsView: string;
  /** Part tags on the drawing: their labels, or their ids. */
  tagMode: "label" | "id";
  readOnly: boolean;
  /** Short message shown on the canvas (e.g. why a connection was refused). */
  hint: string | null;
  /** Orientation of parts that carry none, recomputed when pipes change (parts/orientation.ts). */
  autoOrient: Map<string, Orientation>;
  /** Successive pastes step further away from the original. */
  pasteCount: number;
  /** The Design conditions panel was asked for (a finding's link, the top bar): which field, and a counter so a repeat asks again. */
  designFocus: { field: string | null; n: number } | null;
}

export type CommandOutcome = Partial<BoardState> | { refused: string } | null;

export interface Command<A = void> {
  id: string;
  label: string;
  /** Shortcut shown in the help overlay and bound by the canvas, e.g. "Mod+Z". */
  keys?: string[];
  /** Whether a document change from this command becomes an undo step. */
  recordsHistory: boolean;
  /** Refused on read-only boards. */
  changesDoc: boolean;
  perform(state: BoardState, args: A): CommandOutcome;
}

export type DispatchResult = { ok: true } | { ok: false; reason: string };
