import { partPropsSchemas, partRegistry, partSchema, splitPortRef, type Part, type PartType, type Pipe, type Schematic } from "@/lib/schematic";
import { idGenerator, idPrefix, PIPE_PREFIX } from "./ids";
import type { Command } from "./types";

/** Ports a part joins a pipe run through, inlet then outlet, when it can sit in one: tees, valves, pumps, strainers, meters. */
export function inlinePorts(type: PartType): [string, string] | null {
  const info = partRegistry[type];
  if (info.role === "link" || info.role === "bypass" || info.role === "pump") return info.through ? [info.through[0], info.through[1]] : null;
  if (type === "tee") return ["a", "b"]; // the branch c stays free
  if (type === "diverter-valve") return ["ab", "a"];
  return null;
}

const centre = (doc: Pick<Schematic, "parts">, ref: string) => {
  const p = doc.parts.find((x) => x.id === splitPortRef(ref).partId);
  return p ? { x: p.x, y: p.y } : null;
};

/** Share of the run from the pipe's start to where the part was dropped, 0.1–0.9 (a drawn run is not to scale). */
function shareAt(doc: Pick<Schematic, "parts">, pipe: Pipe, x: number, y: number): number {
  const a = centre(doc, pipe.from);
  const b = centre(doc, pipe.to);
  if (!a || !b) return 0.5;
  const da = Math.hypot(x - a.x, y - a.y);
  const db = Math.hypot(x - b.x, y - b.y);
  return da + db === 0 ? 0.5 : Math.min(0.9, Math.max(0.1, da / (da + db)));
}

const round = (m: number) => Math.round(m * 100) / 100;

/**
 * Drop a tee or a valve onto a pipe: the part goes in at (x, y) and the pipe becomes two
 * connected pipes through it, one undo step. The first keeps the pipe's id (threads and
 * site records pinned to it stay), the second is new; both keep material and size; the
 * length is shared by where the part was dropped; the fittings stay with the first.
 */
export const insertOnPipe: Command<{ type: PartType; x: number; y: number; pipeId: string }> = {
  id: "insert-on-pipe",
  label: "Insert on pipe",
  recordsHistory: true,
  changesDoc: true,
  perform(state, { type, x, y, pipeId }) {
    const ports = inlinePorts(type);
    if (!ports) return { refused: `A ${partRegistry[type]?.label.toLowerCase() ?? type} cannot sit in a pipe run; drop it beside the pipe.` };
    const pipe = state.doc.pipes.find((p) => p.id === pipeId);
    if (!pipe) return { refused: `No pipe '${pipeId}' to insert into.` };
    const ids = idGenerator(state.doc);
    const id = ids(idPrefix[type]);
    const part: Part = partSchema.parse({ id, type, x: Math.round(x), y: Math.round(y), props: partPropsSchemas[type].parse({}) });
    const share = shareAt(state.doc, pipe, x, y);
    const first: Pipe = { ...pipe, to: `${id}.${ports[0]}`, lengthM: round(pipe.lengthM * share) };
    const { fittings: _f, ...rest } = pipe;
    const second: Pipe = { ...rest, id: ids(PIPE_PREFIX), from: `${id}.${ports[1]}`, lengthM: round(pipe.lengthM - first.lengthM),
      fittings: { elbow: 0, bend: 0, teeRun: 0, teeBranch: 0, reducer: 0 } };
    const pipes = state.doc.pipes.flatMap((p) => (p.id === pipeId ? [first, second] : [p]));
    return {
      doc: { ...state.doc, parts: [...state.doc.parts, part], pipes },
      selection: { parts: [id], pipes: [] },
      hint: null,
    };
  },
};
