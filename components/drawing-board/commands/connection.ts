/**
 * The rules for joining two ports, shared by the connect-pipe command and the
 * canvas's live check while a pipe is dragged: a port takes one pipe, a pipe
 * joins two different parts, and both ports must exist.
 */
import { portRefLabel, splitPortRef, type Schematic } from "@/lib/schematic";
import { partPorts } from "./ports";

/** Why from→to cannot be piped, or null when it can. */
export function connectionProblem(doc: Schematic, from: string, to: string): string | null {
  const a = splitPortRef(from);
  const b = splitPortRef(to);
  if (a.partId === b.partId) return "A pipe cannot join a part to itself.";
  for (const end of [a, b]) {
    const part = doc.parts.find((p) => p.id === end.partId);
    if (!part) return `There is no part '${end.partId}'.`;
    if (!partPorts(part).includes(end.port)) return `'${end.port}' is not a port of ${end.partId}.`;
  }
  const busy = doc.pipes.find((p) => p.from === from || p.to === from || p.from === to || p.to === to);
  if (busy) {
    const port = busy.from === from || busy.to === from ? from : to;
    return `The ${portRefLabel(doc, port)} port already has a pipe (${busy.id}); a port takes one pipe.`;
  }
  return null;
}
