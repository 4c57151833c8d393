import type { Knex } from "knex";
import { demoProjects } from "./demo/projects";

// Review in the demo: Orchard End's "Bypass only" is in review, so its history says who
// submitted it, and the reviewer has asked one question on the bypass valve (invented
// words). Only added while the schematic has no threads, so a second run changes nothing.
export async function seed(knex: Knex): Promise<void> {
  const project = demoProjects.find((p) => p.name === "Orchard End")!;
  const s = await knex("schematics").where({ project_id: project.id, name: "Bypass only" }).first("id");
  if (!s) return;
  const rev = await knex("schematic_revisions").where({ schematic_id: s.id, status: "in-review" }).orderBy("number", "desc").first("id");
  if (!rev || (await knex("review_threads").where({ schematic_id: s.id }).first("id"))) return;
  await knex.transaction(async (trx) => {
    await trx("revision_events").insert({ schematic_id: s.id, revision_id: rev.id, kind: "status", from_status: "draft", to_status: "in-review", actor_id: "demo-designer" });
    const [t] = await trx("review_threads").insert({ schematic_id: s.id, revision_id: rev.id, number: 1, anchor_kind: "part", anchor_id: "bp",
      created_by: "demo-reviewer" }).returning("id");
    await trx("thread_messages").insert({ thread_id: t.id, author_id: "demo-reviewer", mentions: ["demo-designer"],
      body: "@Imogen Pryce what opening is the bypass set to? It should stay shut while both zones are open and pass flow only as they close." });
  });
}
