import type { ModeResult, Results } from "@/lib/schematic";

/** The mode the overlay shows: the one asked for, else heating, else the first the engine returned. */
export function modeOf(results: Results | null | undefined, mode?: ModeResult["mode"]): ModeResult | null {
  if (!results) return null;
  return results.modes.find((m) => m.mode === (mode ?? "heating")) ?? results.modes[0] ?? null;
}
