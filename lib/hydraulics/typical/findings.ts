/**
 * What the designer left empty, said once per calculation:
 * - `input.assumed-values` (warning): one finding listing every part sized with
 *   a typical value, the value and its basis; the numbers resting on them carry
 *   `restsOn` in the results;
 * - `input.source-dp-excluded` (warning): a heat source whose own pressure drop
 *   is unknown and has no safe typical value — the head required excludes it;
 * - `input.not-counted` (info): other resistances and water contents left out
 *   (a heat load's, a boiler's water content), with why.
 */
import { partRegistry } from "@/lib/schematic/parts";
import type { Schematic } from "@/lib/schematic/schema";
import type { Findings } from "@/lib/hydraulics/findings/finding";
import type { ResolvedInputs } from "./resolve";

const fieldWords: Record<string, string> = {
  kv: "Kv", valveKv: "valve Kv", waterVolumeL: "water content", coilWaterVolumeL: "coil water content",
};
const words = (field: string) => fieldWords[field] ?? field;

export function inputFindings(doc: Schematic, inputs: ResolvedInputs, findings: Findings): void {
  if (inputs.assumptions.length > 0) {
    const shown = inputs.assumptions.slice(0, 20).map((a) => `${a.part} ${words(a.field)} ${a.value.toFixed(a.kind === "water" ? 1 : 2)}${a.kind === "water" ? " L" : ""}`);
    const more = inputs.assumptions.length > 20 ? `, and ${inputs.assumptions.length - 20} more` : "";
    findings.warning(
      "input.assumed-values",
      `typical values assumed where none was given: ${shown.join(", ")}${more}. Numbers that rest on them are marked ≈ and their working gives each value's basis; type the makers' values to replace them`,
      [...new Set(inputs.assumptions.map((a) => a.part))],
    );
  }
  // the part types, only when some resistance is not counted (most calculations have none)
  const typeOf = inputs.notCounted.some((n) => n.kind === "resistance") ? new Map(doc.parts.map((p) => [p.id, p.type])) : null;
  const sources = inputs.notCounted.filter((n) => n.kind === "resistance" && partRegistry[typeOf!.get(n.part)!].role === "heat-source");
  if (sources.length > 0) {
    findings.warning(
      "input.source-dp-excluded",
      `${sources.map((s) => s.part).join(", ")}: no Kv given for the heat source's own heat exchanger and no typical value is safe (${sources[0]!.basis}), so the head required excludes its pressure drop — type its Kv from the maker's data`,
      sources.map((s) => s.part),
    );
  }
  const rest = inputs.notCounted.filter((n) => !sources.includes(n));
  if (rest.length > 0) {
    findings.info(
      "input.not-counted",
      `not counted, as no typical value is safe: ${rest.map((n) => `${n.part} ${words(n.field)} (${n.basis})`).join("; ")}`,
      [...new Set(rest.map((n) => n.part))],
    );
  }
}
