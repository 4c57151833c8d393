import "server-only";
import { db } from "@/lib/db";
import type { EmitterEntry, Room } from "@/lib/rooms/schema";

// A project's rooms (one jsonb document, lock_version for concurrent editors) and
// the firm's emitter list. Callers validate with lib/rooms/schema.ts first.

export type RoomsRecord = { rooms: Room[]; lockVersion: number; updatedAt: string | null };

export async function getRooms(projectId: string): Promise<RoomsRecord> {
  const row = await db()("project_rooms").where({ project_id: projectId }).first("rooms", "lock_version", "updated_at");
  return row
    ? { rooms: row.rooms as Room[], lockVersion: row.lock_version as number, updatedAt: new Date(row.updated_at).toISOString() }
    : { rooms: [], lockVersion: 0, updatedAt: null };
}

/**
 * Replace the rooms in one statement. With a lockVersion, only when it is still
 * current (0: the project has none saved yet); otherwise the caller gets the current one.
 */
export async function saveRooms(input: { projectId: string; rooms: Room[]; userId: string; lockVersion?: number }):
  Promise<{ ok: true; lockVersion: number; updatedAt: string } | { ok: false; currentLockVersion: number }> {
  return db().transaction(async (trx) => {
    const row = await trx("project_rooms").where({ project_id: input.projectId }).forUpdate().first("lock_version");
    const current = (row?.lock_version as number | undefined) ?? 0;
    if (input.lockVersion !== undefined && input.lockVersion !== current) return { ok: false, currentLockVersion: current };
    const values = { rooms: JSON.stringify(input.rooms), updated_by: input.userId, updated_at: trx.fn.now() };
    const [saved] = row
      ? await trx("project_rooms").where({ project_id: input.projectId }).update({ ...values, lock_version: current + 1 }).returning(["lock_version", "updated_at"])
      : await trx("project_rooms").insert({ project_id: input.projectId, ...values }).returning(["lock_version", "updated_at"]);
    return { ok: true, lockVersion: saved.lock_version as number, updatedAt: new Date(saved.updated_at).toISOString() };
  });
}

export async function firmOfProject(projectId: string): Promise<string | null> {
  const row = await db()("projects").where({ id: projectId }).first("organisation_id");
  return (row?.organisation_id as string | undefined) ?? null;
}

export async function getFirmEmitters(organisationId: string): Promise<{ emitters: EmitterEntry[]; updatedAt: string | null }> {
  const row = await db()("firm_emitters").where({ organisation_id: organisationId }).first("emitters", "updated_at");
  return row ? { emitters: row.emitters as EmitterEntry[], updatedAt: new Date(row.updated_at).toISOString() } : { emitters: [], updatedAt: null };
}

export async function saveFirmEmitters(organisationId: string, emitters: EmitterEntry[], userId: string): Promise<void> {
  await db()("firm_emitters")
    .insert({ organisation_id: organisationId, emitters: JSON.stringify(emitters), updated_by: userId, updated_at: db().fn.now() })
    .onConflict("organisation_id").merge();
}
