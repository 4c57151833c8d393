import { pumpChart } from "@/lib/handover/pump-chart";
import type { Block, ReportInput, ReportModel } from "@/lib/handover/report-model";
import { drawingSvg } from "./drawing-svg";

// The handover report as one HTML document for the browser to show and print: the same
// report model as the PDF, its own stylesheet (print: A4, page numbers in the page margin,
// DRAFT on every printed page), the drawing and pump curves as inline SVG. No scripts.

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

const STYLE = `
@page { size: A4; margin: 16mm 14mm 18mm; @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 8pt 'IBM Plex Sans', Arial, sans-serif; color: #8a8378; } }
body { margin: 0; background: #faf7f2; color: #1f1d1a; font: 10pt/1.45 'IBM Plex Sans', Arial, sans-serif; }
main { max-width: 190mm; margin: 0 auto; padding: 24px 20px 48px; background: #fff; }
h1 { font-size: 20pt; margin: 4px 0 12px; } h2 { color: #7c411b; font-size: 13pt; margin: 22px 0 8px; break-after: avoid; }
.brand { color: #7c411b; font-weight: 600; } .muted { color: #8a8378; } .warn { color: #9a5b00; }
table { border-collapse: collapse; width: 100%; margin: 6px 0 12px; font-size: 8.5pt; }
th { background: #f3ede4; text-align: left; } th, td { padding: 3px 5px; border-bottom: 1px solid #e4ddd2; vertical-align: top; }
td.n { text-align: right; font-family: 'IBM Plex Mono', monospace; white-space: nowrap; } tr { break-inside: avoid; }
.cover td:first-child { color: #4a453e; width: 9em; } .cover { width: auto; font-size: 10pt; } .cover td { border: 0; }
.drawing svg { width: 100%; height: auto; border: 1px solid #e4ddd2; } .chart { break-inside: avoid; margin: 6px 0 14px; }
.draft-banner { color: #c8322b; font-weight: 600; border: 2px solid #c8322b; padding: 4px 8px; margin-bottom: 10px; }
.draft-mark { position: fixed; top: 40%; left: 0; right: 0; text-align: center; font-size: 110pt; font-weight: 700; color: rgba(200,50,43,0.10); transform: rotate(-30deg); pointer-events: none; }
nav ol { padding-left: 1.4em; } nav a { color: #7c411b; }
.print-hint { font-size: 9pt; color: #4a453e; } @media print { .print-hint { display: none; } body { background: #fff; } main { padding: 0; } }
`;

function chartSvg(b: Extract<Block, { kind: "pump-curve" }>): string {
  const c = pumpChart(b.curve, b.duty, 420, 200);
  const L = 46, T = 10;
  const pts = (p: [number, number][]) => p.map(([q, h]) => `${(L + c.x(q)).toFixed(1)},${(T + c.y(h)).toFixed(1)}`).join(" ");
  const grid = [...c.yTicks.map((v) => `<line x1="${L}" x2="${L + c.w}" y1="${T + c.y(v)}" y2="${T + c.y(v)}" stroke="#e4ddd2"/><text x="${L - 6}" y="${T + c.y(v) + 3}" text-anchor="end">${v}</text>`),
    ...c.xTicks.map((q) => `<line y1="${T}" y2="${T + c.h}" x1="${L + c.x(q)}" x2="${L + c.x(q)}" stroke="#e4ddd2"/><text x="${L + c.x(q)}" y="${T + c.h + 12}" text-anchor="middle">${q}</text>`)].join("");
  const duty = c.duty ? `<circle cx="${L + c.x(c.duty[0])}" cy="${T + c.y(c.duty[1])}" r="4" fill="#1f1d1a"/><text x="${L + c.x(c.duty[0]) + 7}" y="${T + c.y(c.duty[1]) - 6}">duty ${c.duty[0].toFixed(2)} m³/h at ${c.duty[1].toFixed(1)} kPa</text>` : "";
  return `<figure class="chart"><figcaption><b>${esc(b.label)}</b> — ${esc(b.mode)} mode</figcaption>
<svg xmlns="http://www.w3.org/2000/svg" width="480" height="240" viewBox="0 0 480 240" font-family="IBM Plex Sans, Arial, sans-serif" font-size="9" fill="#4a453e" role="img" aria-label="Pump curve of ${esc(b.label)} with its duty point">
${grid}<polyline points="${pts(c.system)}" fill="none" stroke="#8a8378" stroke-dasharray="4 3"/><polyline points="${pts(c.curve)}" fill="none" stroke="#b4632b" stroke-width="2"/>${duty}
<text x="${L + c.w}" y="${T + c.h + 26}" text-anchor="end">flow m³/h</text><text x="4" y="${T + 4}">kPa</text></svg>
<p class="muted">Copper: the pump's curve as drawn. Dashed: the system curve through the duty point (square law, a sketch). Dot: the duty point.</p></figure>`;
}

function block(b: Block, input: ReportInput, model: ReportModel): string {
  if (b.kind === "para") return `<p${b.tone ? ` class="${b.tone}"` : ""}>${esc(b.text)}</p>`;
  if (b.kind === "table") {
    const head = `<tr>${b.columns.map((c) => `<th>${esc(c)}</th>`).join("")}</tr>`;
    const rows = b.rows.map((r) => `<tr>${r.map((c, i) => `<td${b.numeric?.[i] ? ' class="n"' : ""}>${esc(c)}</td>`).join("")}</tr>`).join("");
    return `<table><thead>${head}</thead><tbody>${rows}</tbody></table>`;
  }
  if (b.kind === "pump-curve") return chartSvg(b);
  const date = model.cover.find((c) => c[0] === "Date")?.[1] ?? "";
  return `<div class="drawing">${drawingSvg(input.document, { project: input.project.name, schematic: input.schematicName,
    revision: `Revision ${input.revision.number}`, status: model.draft ? `${input.revision.status} (DRAFT)` : "issued", date })}</div>`;
}

export function renderReportHtml(input: ReportInput, model: ReportModel): string {
  const draft = model.draft ? `<div class="draft-mark" aria-hidden="true">DRAFT</div><p class="draft-banner">DRAFT — this revision is not issued: do not build from it.</p>` : "";
  const cover = `<table class="cover">${model.cover.slice(1).map(([k, v]) => `<tr><td>${esc(k)}</td><td><b>${esc(v)}</b></td></tr>`).join("")}</table>`;
  const toc = `<nav aria-label="Contents"><h2>Contents</h2><ol>${model.sections.map((s) => `<li><a href="#${s.id}">${esc(s.title)}</a></li>`).join("")}</ol></nav>`;
  const body = model.sections.map((s, i) => `<section id="${s.id}"><h2>${i + 1}. ${esc(s.title)}</h2>${s.blocks.map((b) => block(b, input, model)).join("\n")}</section>`).join("\n");
  return `<!doctype html><html lang="en-GB"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(model.title)}</title><style>${STYLE}</style></head><body><main>${draft}
<p class="brand">Loopwright — handover report</p><h1>${esc(model.cover[0]![1])}</h1>${cover}
<p class="print-hint">Print this page from the browser (Ctrl+P or ⌘P) for a paper copy; page numbers are added when printing.</p>
${toc}${body}</main></body></html>`;
}
