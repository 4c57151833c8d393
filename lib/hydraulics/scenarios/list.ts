/**
 * Which scenarios to simulate: the schematic's own `scenarios` when it has
 * them, otherwise `all zones open`, `hot water` (with a cylinder), `all zones
 * shut` and `only <zone valve> open` for each zone valve (contract). The
 * per-zone ones are limited to the first MAX_ZONE_SCENARIOS zone valves, and
 * to fewer in very large networks so a calculation stays well under a second
 * (each scenario is one sparse solve); an info finding says so.
 */
import type { EngineContext } from "@/lib/hydraulics/sizing/context";

export const MAX_ZONE_SCENARIOS = 20;
/** Link-iterations budget for the per-zone scenarios (≈ 20 scenarios at 10,000 links). */
const ZONE_SCENARIO_BUDGET = 200_000;

export interface ScenarioSpec {
  name: string;
  mode: "heating" | "hot-water";
  valves: Record<string, boolean | "a" | "b">;
}

export function scenarioList(ctx: EngineContext): ScenarioSpec[] {
  const { doc } = ctx;
  if (doc.scenarios && doc.scenarios.length > 0) {
    return doc.scenarios.map((s) => ({ name: s.name, mode: s.mode, valves: s.valves }));
  }
  const zones = doc.parts.filter((p) => p.type === "zone-valve").map((p) => p.id);
  const all = (open: boolean) => Object.fromEntries(zones.map((z) => [z, open]));
  const list: ScenarioSpec[] = [{ name: "all zones open", mode: "heating", valves: all(true) }];
  if (doc.parts.some((p) => p.type === "cylinder")) list.push({ name: "hot water", mode: "hot-water", valves: {} });
  if (zones.length > 0) list.push({ name: "all zones shut", mode: "heating", valves: all(false) });
  const byBudget = Math.floor(ZONE_SCENARIO_BUDGET / Math.max(1, ctx.model.links.length));
  const limit = Math.min(MAX_ZONE_SCENARIOS, byBudget);
  if (zones.length > limit) {
    ctx.findings.info(
      "scenarios.limited",
      `${zones.length} zone valves: "only … open" scenarios are simulated for the first ${limit} only, to keep the calculation fast; name others in the schematic's scenarios list`,
      zones.slice(limit),
    );
  }
  for (const z of zones.slice(0, limit)) {
    list.push({ name: `only ${z} open`, mode: "heating", valves: { ...all(false), [z]: true } });
  }
  return list;
}
