import { bottom, contentWidth, FAINT, INK, PAGE, RULE, t, type Doc } from "./pdf-kit";

// A table on PDF pages: columns sized by their content, cells wrapped, the head repeated on
// every page the table runs onto, numbers right-aligned in the mono face.

const PAD = 3;
const SIZE = 7.5;

function widths(doc: Doc, columns: string[], rows: string[][]): number[] {
  const total = contentWidth(doc);
  doc.font("Plex").fontSize(SIZE);
  const want = columns.map((c, i) => {
    const longest = Math.max(doc.widthOfString(t(c)), ...rows.map((r) => doc.widthOfString(t(r[i] ?? ""))));
    return Math.min(longest, total * 0.45) + 2 * PAD + 1;
  });
  const sum = want.reduce((a, b) => a + b, 0);
  if (sum <= total) return want.map((w) => (w / sum) * total);
  // shrink the widest columns first: they wrap, short ones stay on one line
  doc.font("Plex-Bold");
  const min = columns.map((c, i) => Math.min(want[i]!, Math.max(40, ...c.split(" ").map((w) => doc.widthOfString(w) + 2 * PAD + 1))));
  doc.font("Plex");
  const spare = total - min.reduce((a, b) => a + b, 0);
  const extra = want.map((w, i) => w - min[i]!);
  const extraSum = extra.reduce((a, b) => a + b, 0) || 1;
  return min.map((m, i) => m + (extra[i]! / extraSum) * spare);
}

function rowHeight(doc: Doc, cells: string[], w: number[], bold: boolean): number {
  doc.font(bold ? "Plex-Bold" : "Plex").fontSize(SIZE);
  return Math.max(...cells.map((c, i) => doc.heightOfString(t(c), { width: w[i]! - 2 * PAD }))) + 2 * PAD;
}

function drawRow(doc: Doc, cells: string[], w: number[], o: { head: boolean; numeric?: boolean[]; shade: boolean }): void {
  const h = rowHeight(doc, cells, w, o.head);
  const y = doc.y;
  let x = PAGE.margin;
  if (o.head) doc.rect(x, y, contentWidth(doc), h).fill("#f3ede4");
  else if (o.shade) doc.rect(x, y, contentWidth(doc), h).fill("#fbf8f3");
  cells.forEach((c, i) => {
    const num = !o.head && o.numeric?.[i];
    doc.fillColor(o.head ? INK : c === "—" ? FAINT : INK).font(o.head ? "Plex-Bold" : num ? "Plex-Mono" : "Plex").fontSize(SIZE)
      .text(t(c), x + PAD, y + PAD, { width: w[i]! - 2 * PAD, align: num ? "right" : "left" });
    x += w[i]!;
  });
  doc.moveTo(PAGE.margin, y + h).lineTo(PAGE.margin + contentWidth(doc), y + h).lineWidth(0.5).strokeColor(RULE).stroke();
  doc.x = PAGE.margin;
  doc.y = y + h;
}

export function drawTable(doc: Doc, columns: string[], rows: string[][], numeric?: boolean[]): void {
  const w = widths(doc, columns, rows);
  const headH = rowHeight(doc, columns, w, true);
  if (doc.y + headH + 14 > bottom(doc)) doc.addPage();
  drawRow(doc, columns, w, { head: true, shade: false });
  rows.forEach((r, k) => {
    if (doc.y + rowHeight(doc, r, w, false) > bottom(doc)) {
      doc.addPage();
      drawRow(doc, columns, w, { head: true, shade: false });
    }
    drawRow(doc, r, w, { head: false, numeric, shade: k % 2 === 1 });
  });
  doc.moveDown(0.8);
}
