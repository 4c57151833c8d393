"use client";

import { useTransition } from "react";
import { saveUnitPreference } from "./actions";
import { flowUnits, pressureUnits, unitLabels, type UnitPrefs } from "@/lib/units/display";
import { useUnits } from "./units-context";

/** Two small selects in the board toolbar; the choice applies at once and is saved for next time. */
export function UnitsPicker() {
  const { prefs, setPrefs } = useUnits();
  const [, start] = useTransition();
  const change = (next: UnitPrefs) => {
    setPrefs(next);
    start(async () => void (await saveUnitPreference(next)));
  };
  const select = "rounded border border-ink/15 bg-white px-1.5 py-1 text-xs text-ink";
  return (
    <div className="flex items-center gap-1.5 text-xs text-ink-soft" data-testid="units-picker">
      <label className="flex items-center gap-1">
        <span className="sr-only sm:not-sr-only">Flow</span>
        <select aria-label="Flow unit" className={select} value={prefs.flow}
          onChange={(e) => change({ ...prefs, flow: e.target.value as UnitPrefs["flow"] })}>
          {flowUnits.map((u) => <option key={u} value={u}>{unitLabels[u]}</option>)}
        </select>
      </label>
      <label className="flex items-center gap-1">
        <span className="sr-only sm:not-sr-only">Pressure</span>
        <select aria-label="Pressure unit" className={select} value={prefs.pressure}
          onChange={(e) => change({ ...prefs, pressure: e.target.value as UnitPrefs["pressure"] })}>
          {pressureUnits.map((u) => <option key={u} value={u}>{unitLabels[u]}</option>)}
        </select>
      </label>
    </div>
  );
}
