import fs from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import { importEmitterCsv } from "../../lib/rooms/emitter-list-csv";
import { importRoomsCsv } from "../../lib/rooms/rooms-csv";
import { demoFirm } from "./demo/people";
import { demoProjects } from "./demo/projects";

// Demo rooms (an invented heat-loss survey of Orchard End) and the firm's invented emitter
// list, read from the same CSV files a user would import. Idempotent: written only when
// the project has no rooms / the firm no list, so a second start keeps what users changed.
const data = (file: string) => fs.readFileSync(path.join(process.cwd(), "db/seeds/data", file), "utf8");

export async function seed(knex: Knex): Promise<void> {
  const orchard = demoProjects.find((p) => p.name === "Orchard End")!;
  const rooms = importRoomsCsv(data("orchard-end-rooms.csv"));
  if (rooms.issues.length) throw new Error(`orchard-end-rooms.csv: ${rooms.issues.map((i) => `line ${i.line} ${i.column}: ${i.message}`).join("; ")}`);
  await knex("project_rooms").insert({ project_id: orchard.id, rooms: JSON.stringify(rooms.rows.map((r) => r.room)), updated_by: "demo-designer" })
    .onConflict("project_id").ignore();
  const list = importEmitterCsv(data("fernbank-emitters.csv"));
  if (list.issues.length) throw new Error(`fernbank-emitters.csv: ${list.issues.map((i) => `line ${i.line}: ${i.message}`).join("; ")}`);
  await knex("firm_emitters").insert({ organisation_id: demoFirm.id, emitters: JSON.stringify(list.emitters), updated_by: "demo-owner" })
    .onConflict("organisation_id").ignore();
}
