import "server-only";
import { db } from "@/lib/db";
import type { UnitPrefs } from "@/lib/units/display";

/** Merge the display units into users.preferences without touching other keys. */
export async function saveUserUnits(userId: string, units: UnitPrefs): Promise<void> {
  await db()("users").where({ id: userId })
    .update({ preferences: db().raw("preferences || ?::jsonb", [JSON.stringify({ units })]) });
}
