import { pumpChart } from "@/lib/handover/pump-chart";
import { COPPER, ensureSpace, FAINT, INK, PAGE, RULE, SOFT, t, type Doc } from "./pdf-kit";

// One pump's curve on a PDF page: axes with ticks, the curve as drawn on the part, the
// system curve through the duty point (dashed) and the duty point itself, all vector.

const W = 300;
const H = 150;
const LEFT = 44;

export function drawPumpCurve(doc: Doc, b: { label: string; mode: string; curve: [number, number][]; duty: { flowM3h: number; headKpa: number } | null }): void {
  ensureSpace(doc, H + 70);
  const c = pumpChart(b.curve, b.duty, W, H);
  doc.font("Plex-Bold").fontSize(8.5).fillColor(INK).text(t(`${b.label} — ${b.mode} mode`), PAGE.margin, doc.y);
  const ox = PAGE.margin + LEFT;
  const oy = doc.y + 8;
  const X = (q: number) => ox + c.x(q);
  const Y = (h: number) => oy + c.y(h);
  doc.lineWidth(0.4).strokeColor(RULE);
  for (const v of c.yTicks) doc.moveTo(ox, Y(v)).lineTo(ox + W, Y(v)).stroke();
  for (const q of c.xTicks) doc.moveTo(X(q), oy).lineTo(X(q), oy + H).stroke();
  doc.lineWidth(0.8).strokeColor(SOFT).moveTo(ox, oy).lineTo(ox, oy + H).lineTo(ox + W, oy + H).stroke();
  doc.font("Plex-Mono").fontSize(6.5).fillColor(SOFT);
  for (const v of c.yTicks) doc.text(String(v), ox - 30, Y(v) - 3, { width: 26, align: "right" });
  for (const q of c.xTicks) doc.text(String(q), X(q) - 15, oy + H + 3, { width: 30, align: "center" });
  doc.font("Plex").fontSize(7).fillColor(SOFT);
  doc.text("flow m³/h", ox + W - 60, oy + H + 13, { width: 60, align: "right" });
  doc.text("head kPa", PAGE.margin - 4, oy - 2, { width: 40 });
  if (c.system.length > 1) {
    doc.moveTo(X(c.system[0]![0]), Y(c.system[0]![1]));
    for (const [q, h] of c.system.slice(1)) doc.lineTo(X(q), Y(h));
    doc.lineWidth(0.8).dash(3, { space: 2 }).strokeColor(FAINT).stroke().undash();
  }
  doc.moveTo(X(c.curve[0]![0]), Y(c.curve[0]![1]));
  for (const [q, h] of c.curve.slice(1)) doc.lineTo(X(q), Y(h));
  doc.lineWidth(1.6).strokeColor(COPPER).stroke();
  if (c.duty) {
    const [q, h] = c.duty;
    doc.circle(X(q), Y(h), 3.2).fillColor(INK).fill();
    doc.font("Plex").fontSize(7).fillColor(INK).text(t(`duty ${q.toFixed(2)} m³/h at ${h.toFixed(1)} kPa`), X(q) + 6, Y(h) - 10, { width: 140 });
  }
  doc.font("Plex").fontSize(6.5).fillColor(FAINT)
    .text("Copper: the pump's curve as drawn. Dashed: the system curve through the duty point (square law, a sketch). Dot: the duty point.", PAGE.margin, oy + H + 24, { width: W + LEFT });
  doc.x = PAGE.margin;
  doc.moveDown(1);
}
