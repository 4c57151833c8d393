import { partRegistry, type Part } from "@/lib/schematic";

/** A part as the site sheet names it: its label, or its type and id. */
export const partName = (p: Pick<Part, "id" | "type" | "label">) => p.label?.trim() || `${partRegistry[p.type]?.label ?? p.type} ${p.id}`;
