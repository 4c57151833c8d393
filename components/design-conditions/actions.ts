"use server";

import { runChecked } from "@/lib/persistence/outcome";
import { setProjectDefaults } from "@/lib/projects/design-conditions";

// The project page's design conditions: what new schematics of the project start with.
export async function saveProjectDefaultsAction(input: { projectId: string; defaults: unknown }) {
  return runChecked(async () => setProjectDefaults(String(input?.projectId ?? ""), input?.defaults));
}
