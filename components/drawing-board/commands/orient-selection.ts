import type { Part } from "@/lib/schematic";
import { explicitOrientation, IDENTITY, type Orientation } from "../parts/orientation";
import type { BoardState, Command } from "./types";

/**
 * Turning or mirroring starts from what is drawn (explicit fields, else the
 * auto orientation) and then stores the result on the part, so it stays put.
 */
function orient(state: BoardState, change: (o: Orientation) => Orientation) {
  const ids = new Set(state.selection.parts);
  if (ids.size === 0) return null;
  const next = (p: Part): Part => {
    const o = change(explicitOrientation(p) ?? state.autoOrient.get(p.id) ?? IDENTITY);
    return { ...p, rotation: o.rotation, flipX: o.flipX };
  };
  return { doc: { ...state.doc, parts: state.doc.parts.map((p) => (ids.has(p.id) ? next(p) : p)) } };
}

export const rotateSelection: Command = {
  id: "rotate-selection",
  label: "Turn 90°",
  keys: ["R"],
  recordsHistory: true,
  changesDoc: true,
  perform: (state) => orient(state, (o) => ({ ...o, rotation: ((o.rotation + 90) % 360) as Orientation["rotation"] })),
};

export const flipSelection: Command = {
  id: "flip-selection",
  label: "Mirror",
  keys: ["X"],
  recordsHistory: true,
  changesDoc: true,
  // mirroring what is on screen: a turned part also turns the other way
  perform: (state) => orient(state, (o) => ({ rotation: ((360 - o.rotation) % 360) as Orientation["rotation"], flipX: !o.flipX })),
};
