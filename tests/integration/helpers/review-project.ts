import { randomUUID } from "node:crypto";
import { db } from "@/lib/db";
import { loadDemoDocument } from "@/db/seeds/demo/projects";
import { cookieForUser } from "./call";
import { deleteForTests } from "./fixture";

// A review project of its own: a new firm (so its review rule can be changed without
// touching anyone else's), one new person per role with an address of their own (so the
// e-mails each receives can be counted), a team schematic with Rev 1 by the designer,
// and the trainee's practice variant.

export const REVIEW_TAG = `review-${randomUUID().slice(0, 6)}`;
const roles = ["owner", "designer", "reviewer", "installer", "trainee"] as const;
export type Role = (typeof roles)[number];

const names: Record<Role, string> = { owner: "Wren Okafor", designer: "Ivo Marsh", reviewer: "Tamsin Reyes", installer: "Cal Dunmore", trainee: "Nell Ferro" };

export interface ReviewProject {
  firmId: string; projectId: string; schematicId: string; practiceId: string; rev1: string; doc: Record<string, unknown>;
  people: Record<Role, { id: string; email: string; name: string; cookie: string }>;
}

export async function makeReviewProject(status: "draft" | "in-review" | "approved" | "issued" = "draft"): Promise<ReviewProject> {
  const tag = randomUUID().slice(0, 8);
  const doc = loadDemoDocument("orchard-end-bypass-only.json", "Review test");
  const people = {} as ReviewProject["people"];
  const ids = await db().transaction(async (trx) => {
    const [firm] = await trx("organisations").insert({ name: `${REVIEW_TAG} firm ${tag}`, slug: `${REVIEW_TAG}-${tag}` }).returning("id");
    const [project] = await trx("projects").insert({ organisation_id: firm.id, name: `${REVIEW_TAG} ${tag}`, created_by: null }).returning("id");
    for (const role of roles) {
      const id = `u_${REVIEW_TAG}_${role}_${tag}`;
      const email = `${role}-${tag}@${REVIEW_TAG}.example.test`;
      await trx("users").insert({ id, email, name: names[role], password_hash: "x" });
      await trx("memberships").insert({ organisation_id: firm.id, user_id: id, role: role === "owner" ? "owner" : "member" });
      await trx("project_members").insert({ project_id: project.id, user_id: id, role });
      people[role] = { id, email, name: names[role], cookie: "" };
    }
    const [s] = await trx("schematics").insert({ project_id: project.id, name: "Plant room", kind: "team", owner_id: people.designer.id, draft: doc, updated_by: people.designer.id }).returning("id");
    const [r] = await trx("schematic_revisions").insert({ schematic_id: s.id, number: 1, document: doc, status, message: "First design", author_id: people.designer.id }).returning("id");
    const [p] = await trx("schematics").insert({ project_id: project.id, name: "Nell's practice", kind: "practice", owner_id: people.trainee.id, variant_of: s.id, draft: doc, updated_by: people.trainee.id }).returning("id");
    return { firmId: firm.id as string, projectId: project.id as string, schematicId: s.id as string, rev1: r.id as string, practiceId: p.id as string };
  });
  for (const role of roles) people[role].cookie = await cookieForUser(people[role].id);
  return { ...ids, doc, people };
}

export async function dropReviewProjects(): Promise<void> {
  await deleteForTests((trx) => trx("organisations").where("name", "like", `${REVIEW_TAG}%`).delete()); // issued revisions too
  await db()("users").where("id", "like", `u_${REVIEW_TAG}_%`).delete();
}
