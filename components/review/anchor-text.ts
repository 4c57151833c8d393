import type { Schematic } from "@/lib/schematic";
import type { Anchor } from "./review-context";

/** "pipe z1-f0", "part Lounge radiator (rad-lounge)", "whole schematic": what a thread is pinned to. */
export function anchorText(a: Anchor, doc: Pick<Schematic, "parts">): string {
  if (a.kind === "schematic" || !a.id) return "whole schematic";
  if (a.kind === "pipe") return `pipe ${a.id}`;
  const label = doc.parts.find((p) => p.id === a.id)?.label;
  return label && label !== a.id ? `part ${label} (${a.id})` : `part ${a.id}`;
}
