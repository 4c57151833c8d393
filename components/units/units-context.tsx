"use client";

import { createContext, useContext, useState, type ReactNode } from "react";
import { defaultUnitPrefs, type UnitPrefs } from "@/lib/units/display";

// The signed-in user's display units, read once by the page from users.preferences and
// changed by the units picker; overlay labels and report tables read it here.
const UnitsContext = createContext<{ prefs: UnitPrefs; setPrefs: (p: UnitPrefs) => void }>({
  prefs: defaultUnitPrefs,
  setPrefs: () => {},
});

export function UnitsProvider({ initial, children }: { initial: UnitPrefs; children: ReactNode }) {
  const [prefs, setPrefs] = useState(initial);
  return <UnitsContext.Provider value={{ prefs, setPrefs }}>{children}</UnitsContext.Provider>;
}

export const useUnits = () => useContext(UnitsContext);
