import { randomUUID } from "node:crypto";
import { db } from "@/lib/db";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { demoFirm } from "@/db/seeds/demo/people";
import { loadDemoDocument } from "@/db/seeds/demo/projects";

// A throw-away project per matrix cell, so an allowed call that changes or deletes things
// never disturbs another cell: the five demo people in their roles, a team schematic with
// one revision, the trainee's practice variant, and a pending invitation.

export type Fixture = {
  projectId: string; projectName: string; teamSchematicId: string; practiceSchematicId: string;
  revisionId: string; invitationId: string; invitationToken: string; lockVersion: number; doc: Record<string, unknown>;
};

// Tagged per test file (each vitest file has its own module instance), so one file's
// clean-up never removes another file's fixtures while it runs.
export const FIXTURE_PREFIX = `Matrix fixture ${randomUUID().slice(0, 6)}`;
const roles = ["owner", "designer", "reviewer", "installer", "trainee"] as const;

export async function makeFixture(o: { revisionStatus?: "draft" | "in-review" | "approved" | "issued" } = {}): Promise<Fixture> {
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
    const [inv] = await trx("invitations").insert({ project_id: projectId, email: `pending-${projectId.slice(0, 8)}@example.test`, role: "designer", token_hash: hash, invited_by: "demo-owner", expires_at: new Date(Date.now() + 86_400_000) }).returning("id");
    return { projectId, projectName, teamSchematicId: team.id, practiceSchematicId: practice.id, revisionId: rev.id, invitationId: inv.id, invitationToken: token, lockVersion: 1, doc };
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
    k("comments").whereIn("revision_id", [f.revisionId]).select("*"),
    k("site_events").where({ project_id: f.projectId }).orderBy("seq").select("*"),
    k("attachments").where({ project_id: f.projectId }).orderBy("id").select("*"),
    k("users").where("id", "like", "demo-%").orderBy("id").select("id", "email", "password_hash"),
    k("projects").where("name", "like", `${FIXTURE_PREFIX} new %`).count("* as n"),
  ]);
  return JSON.stringify(parts);
}

export async function dropFixtures(): Promise<void> {
  await db()("projects").where("name", "like", `${FIXTURE_PREFIX}%`).delete();
}

export { hashToken };
