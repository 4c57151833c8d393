import { calculate } from "@/lib/hydraulics/calculate";
import { parseSchematic } from "@/lib/schematic";

/** Parse and size a document a test built, failing loudly if either refuses it. */
export function sized(doc: unknown) {
  const parsed = parseSchematic(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const res = calculate(parsed.doc);
  if (!res.ok) throw new Error(JSON.stringify(res.issues));
  return { doc: parsed.doc, results: res.results };
}
