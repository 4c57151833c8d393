/**
 * "Apply suggested sizes": the document with every pipe whose engine-suggested
 * size differs from its drawn size changed to it. A pipe may get different
 * suggestions in heating and hot-water mode; the larger one (by catalogue
 * order) wins so neither mode is left undersized. Pure; the board dispatches
 * the result through BoardApi.applyDoc as one undoable step, and the first-draft
 * generator (lib/rooms/draft) sizes its pipes with it.
 */
import { pipeCatalogue } from "@/lib/hydraulics/pipes/catalogue";
import type { Results } from "./results";
import type { Schematic } from "./schema";

export interface SizeChange { id: string; from: string; to: string }

/** Below this a pipe is taken to carry nothing in that mode, m³/h (1 l/h). */
export const NO_FLOW_M3H = 0.001;

function catalogueRank(material: Schematic["pipes"][number]["material"], size: string): number {
  return pipeCatalogue[material].findIndex((row) => row.size === size);
}

export function suggestedSizeChanges(doc: Pick<Schematic, "pipes">, results: Results | null): SizeChange[] {
  if (!results) return [];
  const changes: SizeChange[] = [];
  for (const pipe of doc.pipes) {
    // A mode where the pipe carries no flow gives no basis for a size (the engine then names the smallest).
    const suggestions = results.modes
      .map((m) => m.pipes.find((p) => p.id === pipe.id))
      .filter((r) => r !== undefined && Math.abs(r.flowM3h ?? 0) > NO_FLOW_M3H)
      .map((r) => r!.suggestedSize)
      .filter((s): s is string => typeof s === "string" && catalogueRank(pipe.material, s) >= 0);
    const best = suggestions.sort((a, b) => catalogueRank(pipe.material, b) - catalogueRank(pipe.material, a))[0];
    if (best && best !== pipe.size) changes.push({ id: pipe.id, from: pipe.size, to: best });
  }
  return changes;
}

export function applySuggestedSizes(doc: Schematic, results: Results | null): { doc: Schematic; changes: SizeChange[] } {
  const changes = suggestedSizeChanges(doc, results);
  if (changes.length === 0) return { doc, changes };
  const to = new Map(changes.map((c) => [c.id, c.to]));
  // innerDiameterMm/roughnessMm overrides belong to the old size, so they go with it.
  const pipes = doc.pipes.map((p) => {
    const size = to.get(p.id);
    if (!size) return p;
    const { innerDiameterMm: _d, roughnessMm: _e, ...rest } = p;
    return { ...rest, size };
  });
  return { doc: { ...doc, pipes }, changes };
}
