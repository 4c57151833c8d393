import type { Part } from "@/lib/schematic";

/**
 * The words beside a part on the drawing (canvas and exported sheet): its label (its id
 * when it has none), or its id. Tees carry no label tag — on a plant-room drawing their names ("Tee, Lounge return")
 * only crowd the runs — and show their id in ids mode like every part.
 */
export function partTag(part: Pick<Part, "id" | "type" | "label">, mode: "label" | "id"): string | null {
  if (mode === "id") return part.id;
  if (part.type === "tee") return null;
  return part.label || part.id;
}
