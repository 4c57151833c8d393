import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { revisionWithResults } from "@/lib/revisions/with-results";
import { HANDOVER_CAUTIONS } from "@/lib/handover/cautions";
import { cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture } from "./helpers/fixture";
import { pdfPages, squeeze } from "./helpers/pdf-text";
import { getRaw } from "./helpers/raw-route";

// The handover report (issue 12) of the seeded issued Millbrook revision, read back with
// pdf.js: the project's name, every pipe's size in the schedule, the pump duty and every
// caution; page numbers and contents; DRAFT on every page of an unissued revision; the HTML
// print view says the same.

const MILLBROOK = "6a0f3c1e-0000-4000-8000-000000000101";
const pdfRoute = () => import("@/app/api/v1/revisions/[revisionId]/report.pdf/route");
const htmlRoute = () => import("@/app/api/v1/revisions/[revisionId]/report/route");

let revisionId = "";
let owner: string | null = null;
let pages: string[] = [];
let pdfHeaders: Headers;

async function pdfOf(id: string, cookie: string | null) {
  const res = await getRaw((await pdfRoute()).GET, `/api/v1/revisions/${id}/report.pdf`, cookie, { revisionId: id });
  return { res, bytes: new Uint8Array(await res.arrayBuffer()) };
}

beforeAll(async () => {
  const row = await db()("schematic_revisions as r").join("schematics as s", "s.id", "r.schematic_id")
    .where({ "s.project_id": MILLBROOK, "r.status": "issued" }).orderBy("r.number", "desc").first("r.id");
  revisionId = row.id;
  owner = await cookieFor("owner");
  const { res, bytes } = await pdfOf(revisionId, owner);
  expect(res.status).toBe(200);
  pdfHeaders = res.headers;
  expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
  pages = await pdfPages(bytes);
}, 60_000);
afterAll(dropFixtures);

describe("handover report PDF of the issued Millbrook revision", () => {
  it("is a PDF with the project's name, client and firm on its cover", () => {
    expect(pdfHeaders.get("content-type")).toBe("application/pdf");
    const cover = squeeze(pages[0]!);
    for (const s of ["Millbrook Community Hall", "Millbrook Hall Trust", "Fernbank Heating Co-op", "Handover report"]) expect(cover).toContain(squeeze(s));
  });

  it("lists every pipe of the document in the schedule with its material and size", async () => {
    const r = (await revisionWithResults(revisionId))!;
    const schedule = squeeze(pages.join("\n")).split(squeeze("2. Pipe schedule")).slice(1).join("");
    expect(schedule.length).toBeGreaterThan(0);
    for (const p of r.document.pipes) {
      // the row: its id, the run it makes, then material and size
      expect(schedule, `pipe ${p.id}`).toMatch(new RegExp(`${p.id.replace(/[-]/g, "\\-")}.*?${p.material}${p.size.replace(/x/g, "x")}`));
    }
    for (const size of new Set(r.document.pipes.map((p) => p.size))) expect(schedule).toContain(size);
  });

  it("gives each pump's duty (flow and head from the kept results) beside its curve", async () => {
    const r = (await revisionWithResults(revisionId))!;
    const text = squeeze(pages.join("\n"));
    const duties = r.results!.modes.flatMap((m) => m.pumps).filter((d) => d.designFlowM3h !== null && d.requiredHeadKpa !== null);
    expect(duties.length).toBeGreaterThan(0);
    for (const d of duties) expect(text).toContain(squeeze(`duty ${d.designFlowM3h!.toFixed(2)} m³/h at ${d.requiredHeadKpa!.toFixed(1)} kPa`));
  });

  it("carries every caution the issue names", () => {
    const text = squeeze(pages.join("\n")).toLowerCase();
    for (const c of HANDOVER_CAUTIONS) expect(text).toContain(squeeze(c.text).toLowerCase());
    // the issue's own list, in its words
    for (const w of ["competent person", "local codes", "manufacturers' installation instructions", "licensed practice", "legionella",
      "isolate the electrical supply", "pressure-test", "work at height", "outdoor unit"]) expect(text).toContain(squeeze(w).toLowerCase());
  });

  it("has a contents list, page numbers on every page and no DRAFT mark", () => {
    expect(squeeze(pages[1]!)).toContain("Contents");
    pages.forEach((p, i) => expect(squeeze(p)).toContain(`Page${i + 1}of${pages.length}`));
    expect(pages.join("\n")).not.toContain("DRAFT");
    for (const title of ["Schematic", "Circuits and balancing", "Pump duty", "Bypass", "Expansion vessel", "Settings to make on site", "Pressure tests", "Commissioning", "Findings still open", "Cautions"]) {
      expect(squeeze(pages[1]!)).toContain(squeeze(title));
    }
  });

  it("is kept once made (issued revisions), and a signed-out caller gets 401", async () => {
    const again = await pdfOf(revisionId, owner);
    expect(again.res.headers.get("x-report-cache")).toBe("hit");
    expect((await pdfOf(revisionId, null)).res.status).toBe(401);
  });
});

describe("a draft's report", () => {
  it("is marked DRAFT on every page and made fresh each time", async () => {
    const f = await makeFixture({ revisionStatus: "draft" });
    const { res, bytes } = await pdfOf(f.revisionId, owner);
    expect(res.status).toBe(200);
    expect(res.headers.get("x-report-cache")).toBe("miss");
    const draftPages = await pdfPages(bytes);
    expect(draftPages.length).toBeGreaterThan(3);
    for (const p of draftPages) expect(p).toContain("DRAFT");
    expect((await pdfOf(f.revisionId, owner)).res.headers.get("x-report-cache")).toBe("miss");
  }, 30_000);
});

describe("site records in the report", () => {
  it("lists a pressure test made against the revision with its verdict, witness and author", async () => {
    const f = await makeFixture({ revisionStatus: "issued" });
    await db()("site_events").insert({ id: randomUUID(), project_id: f.projectId, schematic_id: f.teamSchematicId, revision_id: f.revisionId, kind: "pressure-test",
      data: JSON.stringify({ medium: "water", testPressureBar: 4.5, startPressureBar: 4.5, endPressureBar: 4.45, startedAt: "2026-12-03T09:00:00Z",
        endedAt: "2026-12-03T10:00:00Z", ambientStartC: 12, ambientEndC: 13, witness: "Rowan Witness (invented)" }),
      context: "{}", made_at: "2026-12-03T10:05:00Z", author_id: "demo-installer" });
    const text = squeeze((await pdfPages((await pdfOf(f.revisionId, owner)).bytes)).join("\n"));
    const tests = text.split(squeeze("Pressure tests")).slice(-1)[0]!;
    expect(tests).toContain(squeeze("Rowan Witness (invented)"));
    // 0.05 bar over 60 min is within the default rule (at most 0.2 bar over 60 min — lib/site/pressure-test.ts, common practice)
    expect(tests).toContain("PASS");
    expect(tests).toContain("0.05");
  }, 30_000);
});

describe("HTML print view", () => {
  it("says the same: project, sections, the drawing as SVG, cautions", async () => {
    const res = await getRaw((await htmlRoute()).GET, `/api/v1/revisions/${revisionId}/report`, owner, { revisionId });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/html");
    const html = await res.text();
    expect(html).toContain("Millbrook Community Hall");
    expect(html).toContain("<svg");
    expect(html).toContain("Pipe schedule");
    expect(html).toContain("@bottom-right");
    for (const c of HANDOVER_CAUTIONS) expect(html).toContain(c.text.replace(/'/g, "&#39;"));
    expect(html).not.toContain("<script");
  });
});
