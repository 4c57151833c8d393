import { randomUUID } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { demoFirm } from "@/db/seeds/demo/people";
import { loadDemoDocument } from "@/db/seeds/demo/projects";

// A throw-away project per matrix cell, so an allowed call that changes or deletes things
// never disturbs another cell: the five demo people in their roles, a team schematic with
// one revision, the trainee's practice variant with one, a review thread on each, and a
// pending invitation.

export type Fixture = {
  projectId: string; projectName: string; teamSchematicId: string; practiceSchematicId: string;
  revisionId: string; invitationId: string; invitationToken: string; lockVersion: number; doc: Record<string, unknown>;
  /** Review: the reviewer's thread (and its first message) on the team revision; the trainee's on their practice variant's revision. */
  threadId: string; messageId: string; practiceRevisionId: string; practiceThreadId: string;
};

// Tagged per test file (each vitest file has its own module instance), so one file's
// clean-up never removes another file's fixtures while it runs.
export const FIXTURE_PREFIX = `Matrix fixture ${randomUUID().slice(0, 6)}`;
const roles = ["owner", "designer", "reviewer", "installer", "trainee"] as const;

/** The demo rooms (db/seeds/data/orchard-end-rooms.json), for fixtures that ask for rooms. */
const demoRooms = () => JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-rooms.json"), "utf8")).rooms;

export async function makeFixture(o: { revisionStatus?: "draft" | "in-review" | "approved" | "issued"; rooms?: boolean } = {}): Promise<Fixture> {
  const projectId = randomUUID();
  const projectName = `${FIXTURE_PREFIX} ${projectId.slice(0, 8)}`;
  const doc = loadDemoDocument("millbrook-hall.json", projectName);
  const { token, hash } = newToken();
  return db().transaction(async (trx) => {
    await trx("projects").insert({ id: projectId, organisation_id: demoFirm.id, name: projectName, created_by: "demo-owner" });
    await trx("project_members").insert(roles.map((r) => ({ project_id: projectId, user_id: `demo-${r}`, role: r })));
    const [team] = await trx("schematics").insert({ project_id: projectId, name: "Plant room", kind: "team", owner_id: "demo-designer", draft: doc, updated_by: "demo-designer" }).returning("id");
    const [rev] = await trx("schematic_revisions").insert({ schematic_id: team.id, number: 1, document: doc, status: o.revisionStatus ?? "draft", author_id: "demo-designer" }).returning("id");
    const [practice] = await trx("schematics").insert({ project_id: projectId, name: "Nia's practice", kind: "practice", owner_id: "demo-trainee", variant_of: team.id, draft: doc, updated_by: "demo-trainee" }).returning("id");
    if (o.rooms) await trx("project_rooms").insert({ project_id: projectId, rooms: JSON.stringify(demoRooms()), updated_by: "demo-designer" });
    const [prev] = await trx("schematic_revisions").insert({ schematic_id: practice.id, number: 1, document: doc, status: "draft", author_id: "demo-trainee" }).returning("id");
    const thread = async (schematicId: string, revisionId: string, by: string) => {
      const [t] = await trx("review_threads").insert({ schematic_id: schematicId, revision_id: revisionId, number: 1, anchor_kind: "schematic", created_by: by }).returning("id");
      const [m] = await trx("thread_messages").insert({ thread_id: t.id, author_id: by, body: "Check the bypass setting." }).returning("id");
      return { threadId: t.id as string, messageId: m.id as string };
    };
    const team1 = await thread(team.id, rev.id, "demo-reviewer");
    const practice1 = await thread(practice.id, prev.id, "demo-trainee");
    const [inv] = await trx("invitations").insert({ project_id: projectId, email: `pending-${projectId.slice(0, 8)}@example.test`, role: "designer", token_hash: hash, invited_by: "demo-owner", expires_at: new Date(Date.now() + 86_400_000) }).returning("id");
    return { projectId, projectName, teamSchematicId: team.id, practiceSchematicId: practice.id, revisionId: rev.id, invitationId: inv.id, invitationToken: token, lockVersion: 1, doc,
      ...team1, practiceRevisionId: prev.id, practiceThreadId: practice1.threadId };
  });
}

/** Everything a denied call must leave untouched, as one comparable value. */
export async function snapshot(f: Fixture): Promise<string> {
  const k = db();
  const parts = await Promise.all([
    k("projects").where({ id: f.projectId }).select("*"),
    k("project_members").where({ project_id: f.projectId }).orderBy("user_id").select("*"),
    k("invitations").where({ project_id: f.projectId }).orderBy("id").select("*"),
    k("schematics").where({ project_id: f.projectId }).orderBy("id").select("*"),
    k("schematic_revisions").whereIn("schematic_id", [f.teamSchematicId, f.practiceSchematicId]).orderBy("id").select("*"),
    k("review_threads").whereIn("schematic_id", [f.teamSchematicId, f.practiceSchematicId]).orderBy("id").select("*"),
    k("thread_messages").whereIn("thread_id", k("review_threads").whereIn("schematic_id", [f.teamSchematicId, f.practiceSchematicId]).select("id")).orderBy("id").select("*"),
    k("revision_events").whereIn("schematic_id", [f.teamSchematicId, f.practiceSchematicId]).orderBy("id").select("*"),
    k("organisations").where({ id: demoFirm.id }).select("no_self_approval"),
    k("site_events").where({ project_id: f.projectId }).orderBy("seq").select("*"),
    k("attachments").where({ project_id: f.projectId }).orderBy("id").select("*"),
    k("users").where("id", "like", "demo-%").orderBy("id").select("id", "email", "password_hash"),
    k("projects").where("name", "like", `${FIXTURE_PREFIX} new %`).count("* as n"),
    k("project_rooms").where({ project_id: f.projectId }).select("*"),
    k("firm_emitters").where({ organisation_id: demoFirm.id }).select("*"),
    k("project_price_lists").where({ project_id: f.projectId }).select("*"),
  ]);
  return JSON.stringify(parts);
}

export async function dropFixtures(): Promise<void> {
  await deleteForTests((trx) => trx("projects").where("name", "like", `${FIXTURE_PREFIX}%`).delete());
}

/**
 * Test clean-up only: runs `del` (deleting projects or schematics) even when issued revisions
 * would go with them, which the database otherwise refuses (migration 20261203000001). The
 * trigger is switched off inside this one transaction (DDL is transactional in PostgreSQL;
 * the table owner may do it), so foreign-key cascades still run and no other session ever sees it off.
 */
export async function deleteForTests(del: (trx: Knex.Transaction) => Promise<unknown>): Promise<void> {
  await db().transaction(async (trx) => {
    await trx.raw("alter table schematic_revisions disable trigger lw_revision_immutable");
    await del(trx);
    await trx.raw("alter table schematic_revisions enable trigger lw_revision_immutable");
  });
}
