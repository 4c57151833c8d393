/**
 * The handover report as plain data: a cover and numbered sections of paragraphs, tables,
 * the drawing and pump curves. One model, two renderings — the PDF (components/handover/
 * report-pdf.ts) and the HTML print view (report-html.ts) — so both say the same thing.
 * Pure and client-safe: it reads the document, its kept results and the site records;
 * nothing is sized here.
 */
import type { Results, Schematic } from "@/lib/schematic";
import type { SiteRecords } from "@/lib/site/records";
import { HANDOVER_CAUTIONS } from "./cautions";
import { recordSections, settingsSection } from "./report-site";
import type { Block, Section } from "./report-blocks";
import { sizingSections } from "./report-sizing";

export type { Block, Section } from "./report-blocks";

export interface ReportInput {
  project: { name: string; client: string; site: string; firm: string };
  schematicName: string;
  revision: { id: string; number: number; status: string; createdAt: string; statusChangedAt: string; authorName: string | null };
  document: Schematic;
  results: Results | null;
  records: SiteRecords;
  openThreads: { number: number; anchor: string; firstLine: string }[];
}

export interface ReportModel {
  title: string;
  /** Unissued revisions are marked DRAFT on every page. */
  draft: boolean;
  cover: [string, string][];
  sections: Section[];
}

const day = (iso: string) => iso.slice(0, 10);

function findingsSection(input: ReportInput): Section {
  const findings = input.results?.findings.filter((f) => f.severity !== "info") ?? [];
  const blocks: Block[] = [];
  if (!input.results) blocks.push({ kind: "para", tone: "warn", text: "This revision could not be sized: its document is not valid for the engine. No sizing numbers are given." });
  blocks.push(findings.length
    ? { kind: "table", columns: ["Severity", "Finding", "Parts and pipes"], rows: findings.map((f) => [f.severity, f.message, f.refs.join(", ")]) }
    : { kind: "para", text: "The sizing raised no errors or warnings for this revision." });
  if (input.openThreads.length) {
    blocks.push({ kind: "para", text: "Review threads still open on this schematic:" });
    blocks.push({ kind: "table", columns: ["#", "On", "Question"], rows: input.openThreads.map((t) => [String(t.number), t.anchor, t.firstLine]) });
  }
  return { id: "findings", title: "Findings still open", blocks };
}

export function reportModel(input: ReportInput): ReportModel {
  const { project, revision } = input;
  const draft = revision.status !== "issued";
  const sections: Section[] = [
    { id: "schematic", title: "Schematic", blocks: [
      { kind: "para", text: "Flow pipes are drawn red and return pipes blue; each pipe is captioned with its size and length." },
      { kind: "drawing" },
    ] },
    ...(input.results ? sizingSections(input.document, input.results) : []),
    settingsSection(input.document, input.results),
    ...recordSections(input.records),
    findingsSection(input),
    { id: "cautions", title: "Cautions", blocks: HANDOVER_CAUTIONS.map((c) => ({ kind: "para" as const, text: `${c.title}. ${c.text}` })) },
  ];
  return {
    title: `${project.name} — ${input.schematicName} — revision ${revision.number}`,
    draft,
    cover: [
      ["Project", project.name], ["Site", project.site || "—"], ["Client", project.client || "—"],
      ["Schematic", input.schematicName], ["Revision", `${revision.number} (${revision.status})${draft ? " — DRAFT, not issued" : ""}`],
      ["Date", day(draft ? revision.createdAt : revision.statusChangedAt)], ["Designed by", revision.authorName ?? "—"], ["Firm", project.firm],
    ],
    sections,
  };
}
