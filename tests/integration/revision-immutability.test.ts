import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { dropFixtures, makeFixture } from "./helpers/fixture";

// The database refuses to change a saved revision's document, and refuses every UPDATE and
// DELETE of an issued revision (migrations 20261202000001, 20261203000001), whatever code path tries.

async function issuedRevision() {
  const f = await makeFixture({ revisionStatus: "issued" });
  const row = await db()("schematic_revisions").where({ id: f.revisionId }).first();
  return { f, row: row as Record<string, unknown> & { id: string; document: Record<string, unknown> } };
}

describe("schematic revisions are immutable in PostgreSQL", () => {
  afterAll(async () => {
    await dropFixtures();
    await db().destroy();
  });

  it("refuses a change to the document and leaves it as it was", async () => {
    const { row } = await issuedRevision();
    await expect(db()("schematic_revisions").where({ id: row.id }).update({ document: { ...row.document, name: "tampered" } }))
      .rejects.toThrow(/issued/);
    expect((await db()("schematic_revisions").where({ id: row.id }).first()).document).toEqual(row.document);
  });

  it("refuses a change to a draft revision's document too", async () => {
    const f = await makeFixture({ revisionStatus: "draft" });
    await expect(db()("schematic_revisions").where({ id: f.revisionId }).update({ document: { ...f.doc, name: "tampered" } }))
      .rejects.toThrow(/immutable/);
  });

  it("refuses to move an issued revision back", async () => {
    const { row } = await issuedRevision();
    await expect(db()("schematic_revisions").where({ id: row.id }).update({ status: "draft" })).rejects.toThrow(/issued/);
  });

  // issue 17 item 13: message, number, author, dates and schematic could still be changed, and the row deleted
  it("item 13: refuses every other change to an issued revision, and its deletion, leaving the row as it was", async () => {
    const { f, row } = await issuedRevision();
    const other = await makeFixture();
    const changes: Record<string, unknown>[] = [
      { message: "rewritten" }, { number: 99 }, { author_id: "demo-owner" }, { created_at: new Date(0) },
      { status_changed_at: new Date(0) }, { schematic_id: other.teamSchematicId }, { schema_version: 2 },
    ];
    for (const change of changes) {
      await expect(db()("schematic_revisions").where({ id: row.id }).update(change), JSON.stringify(change)).rejects.toThrow(/issued/);
    }
    await expect(db()("schematic_revisions").where({ id: row.id }).delete()).rejects.toThrow(/issued/);
    // nor through the cascades of deleting its schematic or project
    await expect(db()("schematics").where({ id: f.teamSchematicId }).delete()).rejects.toThrow(/issued/);
    await expect(db()("projects").where({ id: f.projectId }).delete()).rejects.toThrow(/issued/);
    expect(await db()("schematic_revisions").where({ id: row.id }).first()).toEqual(row);
  });

  it("still lets a revision that is not issued move on (its status and status time change)", async () => {
    const f = await makeFixture({ revisionStatus: "approved" });
    await expect(db()("schematic_revisions").where({ id: f.revisionId }).update({ status: "issued", status_changed_at: db().fn.now() })).resolves.toBe(1);
  });
});
