"use server";

import { requireUser } from "@/lib/auth/authorize";
import { saveUserUnits } from "@/db/queries/user-preferences";
import { runChecked } from "@/lib/persistence/outcome";
import { unitPrefsSchema } from "@/lib/units/display";

// The signed-in person's display units (a preference of theirs, not of a project).
export async function saveUnitPreference(input: unknown) {
  return runChecked(async () => {
    const units = unitPrefsSchema.parse(input);
    const user = await requireUser();
    await saveUserUnits(user.id, units);
    return units;
  });
}
