import "server-only";
import { db } from "@/lib/db";
import { initialsOf } from "@/lib/review/mentions";
import type { Present } from "@/lib/review/types";

// Who is looking at a board: one row per open live stream, in PostgreSQL so every app
// instance sees every other's (DEVELOPERS.md: state instances must agree on lives there).
// Each stream refreshes its row on its heartbeat; a row a minute old belongs to an
// instance that stopped without saying goodbye, and is not counted.

export const PRESENCE_STALE_S = 60;

export type { Present };

export async function arrive(connectionId: string, schematicId: string, userId: string): Promise<void> {
  await db()("board_presence").where("seen_at", "<", db().raw(`now() - interval '${PRESENCE_STALE_S * 5} seconds'`)).delete();
  await db()("board_presence").insert({ connection_id: connectionId, schematic_id: schematicId, user_id: userId });
}

export async function stillHere(connectionId: string): Promise<void> {
  await db()("board_presence").where({ connection_id: connectionId }).update({ seen_at: db().fn.now() });
}

export async function leave(connectionId: string): Promise<void> {
  await db()("board_presence").where({ connection_id: connectionId }).delete();
}

/** Everyone looking now, once each (several tabs are one person), by name. */
export async function presentOn(schematicId: string): Promise<Present[]> {
  const rows = await db()("board_presence as p").join("users as u", "u.id", "p.user_id")
    .where("p.schematic_id", schematicId).andWhere("p.seen_at", ">", db().raw(`now() - interval '${PRESENCE_STALE_S} seconds'`))
    .distinct("u.id", "u.name").orderBy("u.name");
  return rows.map((r) => ({ userId: r.id, name: r.name, initials: initialsOf(r.name) }));
}
