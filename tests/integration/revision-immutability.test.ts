import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";

// The database refuses to change a saved revision's document or an issued revision's status
// (migration 20261202000001), whatever code path tries.
const MILLBROOK = "6a0f3c1e-0000-4000-8000-000000000101";

async function issuedRevision() {
  const row = await db()("schematic_revisions as r").join("schematics as s", "s.id", "r.schematic_id")
    .where({ "s.project_id": MILLBROOK, "r.status": "issued" }).first("r.id", "r.document");
  if (!row) throw new Error("the seed has no issued Millbrook revision");
  return row as { id: string; document: Record<string, unknown> };
}

describe("schematic revisions are immutable in PostgreSQL", () => {
  afterAll(async () => { await db().destroy(); });

  it("refuses a change to the document and leaves it as it was", async () => {
    const rev = await issuedRevision();
    await expect(db()("schematic_revisions").where({ id: rev.id }).update({ document: { ...rev.document, name: "tampered" } }))
      .rejects.toThrow(/immutable/);
    expect((await issuedRevision()).document).toEqual(rev.document);
  });

  it("refuses to move an issued revision back", async () => {
    const rev = await issuedRevision();
    await expect(db()("schematic_revisions").where({ id: rev.id }).update({ status: "draft" })).rejects.toThrow(/final/);
  });

  it("still lets other columns change (the status timestamp)", async () => {
    const [row] = await db()("schematic_revisions as r").join("schematics as s", "s.id", "r.schematic_id")
      .where({ "s.project_id": MILLBROOK }).select("r.id", "r.status_changed_at");
    await expect(db()("schematic_revisions").where({ id: row.id }).update({ status_changed_at: row.status_changed_at })).resolves.toBe(1);
  });
});
