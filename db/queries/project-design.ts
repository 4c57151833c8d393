import "server-only";
import { db } from "@/lib/db";

/** The project's stored design conditions (jsonb), or undefined when the project does not exist. */
export async function getProjectDesignConditions(projectId: string): Promise<unknown> {
  const row = await db()("projects").where({ id: projectId }).first("design_conditions");
  return row ? row.design_conditions : undefined;
}

export async function saveProjectDesignConditions(projectId: string, value: unknown): Promise<void> {
  await db()("projects").where({ id: projectId }).update({ design_conditions: JSON.stringify(value), updated_at: db().fn.now() });
}
