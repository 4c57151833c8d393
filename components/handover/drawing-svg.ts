import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import type { Schematic } from "@/lib/schematic";
import { DrawingSheet, type TitleBlock } from "@/components/drawing-board/export/drawing-sheet";

// The schematic as the printed drawing sheet's SVG text (the board's symbols, flow red and
// return blue), for the handover report's PDF page and its HTML print view.

export function drawingSvg(doc: Schematic, title: TitleBlock): string {
  return renderToStaticMarkup(createElement(DrawingSheet, { doc, title, tags: "label" }));
}
