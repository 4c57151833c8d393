/**
 * Copy/paste/duplicate share this: take the selected parts with the pipes
 * running between them, then insert them again under fresh ids, pipes
 * re-pointed at the new parts.
 */
import { splitPortRef, type Part, type Pipe, type Schematic } from "@/lib/schematic";
import { idGenerator, idPrefix, PIPE_PREFIX } from "./ids";
import type { BoardState, Clipboard } from "./types";

export function copySelection(state: BoardState): Clipboard | null {
  const ids = new Set(state.selection.parts);
  if (ids.size === 0) return null;
  const parts = state.doc.parts.filter((p) => ids.has(p.id));
  const pipes = state.doc.pipes.filter(
    (p) => ids.has(splitPortRef(p.from).partId) && ids.has(splitPortRef(p.to).partId),
  );
  return { kind: "loopwright/clipboard", parts, pipes };
}

export function insertClipboard(doc: Schematic, clip: Clipboard, dx: number, dy: number) {
  const nextId = idGenerator(doc);
  const rename = new Map<string, string>();
  const parts: Part[] = clip.parts.map((p) => {
    const id = nextId(idPrefix[p.type] ?? "part");
    rename.set(p.id, id);
    return { ...p, id, x: p.x + dx, y: p.y + dy };
  });
  const moveRef = (ref: string) => {
    const { partId, port } = splitPortRef(ref);
    return `${rename.get(partId) ?? partId}.${port}`;
  };
  const pipes: Pipe[] = clip.pipes
    .filter((p) => rename.has(splitPortRef(p.from).partId) && rename.has(splitPortRef(p.to).partId))
    .map((p) => ({ ...p, id: nextId(PIPE_PREFIX), from: moveRef(p.from), to: moveRef(p.to) }));
  return {
    doc: { ...doc, parts: [...doc.parts, ...parts], pipes: [...doc.pipes, ...pipes] },
    selection: { parts: parts.map((p) => p.id), pipes: pipes.map((p) => p.id) },
  };
}
