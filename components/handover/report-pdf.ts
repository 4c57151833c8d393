import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";
import type { ReportInput, ReportModel, Section } from "@/lib/handover/report-model";
import { FIRST_CAUTION_LINE } from "@/lib/handover/cautions";
import { drawingSvg } from "./drawing-svg";
import { drawPumpCurve } from "./pdf-pump-curve";
import { COPPER, COPPER_DARK, contentWidth, ensureSpace, FAINT, INK, PAGE, registerFonts, SOFT, t, WARN, type Doc } from "./pdf-kit";
import { drawTable } from "./pdf-table";

// The handover report as a PDF (pdfkit): cover, contents with page numbers, the sections
// of the report model (lib/handover/report-model.ts) with the schematic as vector drawing on
// its own landscape page, page numbers on every page and, for an unissued revision, DRAFT
// on every page. Text is real text in the embedded IBM Plex fonts: selectable, searchable.

function cover(doc: Doc, model: ReportModel): void {
  doc.rect(0, 0, doc.page.width, 10).fill(COPPER);
  doc.font("Plex-Bold").fontSize(13).fillColor(COPPER_DARK).text("Loopwright", PAGE.margin, 64);
  doc.font("Plex").fontSize(11).fillColor(SOFT).text("Handover report", PAGE.margin, doc.y + 2);
  doc.font("Plex-Bold").fontSize(22).fillColor(INK).text(t(model.cover[0]![1]), PAGE.margin, 150, { width: contentWidth(doc) });
  doc.moveDown(1.2);
  for (const [k, v] of model.cover.slice(1)) {
    const y = doc.y;
    doc.font("Plex").fontSize(10).fillColor(SOFT).text(k, PAGE.margin, y, { width: 110 });
    doc.font("Plex-Bold").fontSize(10).fillColor(INK).text(t(v), PAGE.margin + 110, y, { width: contentWidth(doc) - 110 });
    doc.moveDown(0.5);
  }
  doc.font("Plex").fontSize(9).fillColor(WARN).text(t(FIRST_CAUTION_LINE), PAGE.margin, doc.page.height - 150, { width: contentWidth(doc) });
  doc.fillColor(SOFT).text("Every caution is in the last section of this report.", { width: contentWidth(doc) });
}

function heading(doc: Doc, n: number, s: Section): void {
  ensureSpace(doc, 60);
  doc.moveDown(0.4);
  doc.font("Plex-Bold").fontSize(13).fillColor(COPPER_DARK).text(t(`${n}. ${s.title}`), PAGE.margin, doc.y);
  doc.moveDown(0.4);
}

function drawing(doc: Doc, input: ReportInput, model: ReportModel): void {
  const svg = drawingSvg(input.document, { project: input.project.name, schematic: input.schematicName,
    revision: `Revision ${input.revision.number}`, status: model.draft ? `${input.revision.status} (DRAFT)` : "issued", date: model.cover.find((c) => c[0] === "Date")?.[1] ?? "" });
  const top = doc.y + 4;
  // the sheet's own text sits low on the page: it must not make pdfkit start a new one
  const margins = doc.page.margins;
  doc.page.margins = { ...margins, bottom: 0 };
  SVGtoPDF(doc, svg, PAGE.margin, top, {
    width: contentWidth(doc), height: doc.page.height - top - PAGE.margin - PAGE.footer, preserveAspectRatio: "xMidYMid meet",
    fontCallback: (_family: string, bold: boolean) => (bold ? "Plex-Bold" : "Plex"),
  });
  doc.page.margins = margins;
}

/** The section's blocks after its heading; the page number it starts on. A drawing gets a landscape page of its own. */
function section(doc: Doc, s: Section, n: number, input: ReportInput, model: ReportModel): number {
  const hasDrawing = s.blocks.some((b) => b.kind === "drawing");
  if (hasDrawing || doc.bufferedPageRange().count === 2) doc.addPage({ size: "A4", layout: hasDrawing ? "landscape" : "portrait", margin: PAGE.margin });
  heading(doc, n, s);
  doc.addNamedDestination(s.id);
  doc.outline.addItem(`${n}. ${s.title}`);
  const page = doc.bufferedPageRange().count;
  for (const b of s.blocks) {
    if (b.kind === "para") {
      ensureSpace(doc, 24);
      doc.font("Plex").fontSize(8.5).fillColor(b.tone === "warn" ? WARN : b.tone === "muted" ? FAINT : INK)
        .text(t(b.text), PAGE.margin, doc.y, { width: contentWidth(doc) });
      doc.moveDown(0.5);
    } else if (b.kind === "table") drawTable(doc, b.columns, b.rows, b.numeric);
    else if (b.kind === "pump-curve") drawPumpCurve(doc, b);
    else if (b.kind === "drawing") drawing(doc, input, model);
  }
  if (hasDrawing) doc.addPage({ size: "A4", layout: "portrait", margin: PAGE.margin });
  return page;
}

function contents(doc: Doc, model: ReportModel, pages: number[]): void {
  doc.switchToPage(1);
  doc.font("Plex-Bold").fontSize(15).fillColor(COPPER_DARK).text("Contents", PAGE.margin, PAGE.margin + 10);
  doc.moveDown(0.8);
  model.sections.forEach((s, i) => {
    const y = doc.y;
    doc.font("Plex").fontSize(10).fillColor(INK).text(t(`${i + 1}. ${s.title}`), PAGE.margin, y, { width: contentWidth(doc) - 50, goTo: s.id } as PDFKit.Mixins.TextOptions);
    doc.font("Plex-Mono").fontSize(10).text(String(pages[i]), PAGE.margin + contentWidth(doc) - 50, y, { width: 50, align: "right" });
    doc.moveDown(0.35);
  });
}

function pageFurniture(doc: Doc, model: ReportModel): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    // writing in the bottom margin must not start a new page
    const margins = doc.page.margins;
    doc.page.margins = { ...margins, bottom: 0 };
    if (model.draft) {
      doc.save().rotate(-30, { origin: [width / 2, height / 2] }).font("Plex-Bold").fontSize(110).fillColor("#c8322b").fillOpacity(0.12)
        .text("DRAFT", 0, height / 2 - 60, { width, align: "center", lineBreak: false }).restore();
      doc.fillOpacity(1).font("Plex-Bold").fontSize(8).fillColor("#c8322b")
        .text("DRAFT — this revision is not issued: do not build from it.", PAGE.margin, 20, { width: width - 2 * PAGE.margin, lineBreak: false });
    }
    doc.fillOpacity(1).font("Plex").fontSize(7.5).fillColor(FAINT)
      .text(t(model.title), PAGE.margin, height - PAGE.margin + 8, { width: width - 2 * PAGE.margin - 80, lineBreak: false });
    doc.text(`Page ${i + 1} of ${range.count}`, width - PAGE.margin - 80, height - PAGE.margin + 8, { width: 80, align: "right", lineBreak: false });
    doc.page.margins = margins;
  }
}

export async function renderReportPdf(input: ReportInput, model: ReportModel): Promise<Buffer> {
  const created = new Date(model.draft ? input.revision.createdAt : input.revision.statusChangedAt);
  const doc = new PDFDocument({ size: "A4", margin: PAGE.margin, bufferPages: true, autoFirstPage: true, lang: "en-GB", displayTitle: true,
    info: { Title: model.title, Author: input.project.firm, Subject: "Handover report", Creator: "Loopwright", CreationDate: created, ModDate: created } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => { doc.on("end", () => resolve(Buffer.concat(chunks))); doc.on("error", reject); });
  registerFonts(doc);
  cover(doc, model);
  doc.addPage(); // contents, written once the sections' pages are known
  const pages = model.sections.map((s, i) => section(doc, s, i + 1, input, model));
  contents(doc, model, pages);
  pageFurniture(doc, model);
  doc.end();
  return done;
}
