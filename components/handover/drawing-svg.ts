import { createElement } from "react";
import type { Schematic } from "@/lib/schematic";
import { DrawingSheet, type TitleBlock } from "@/components/drawing-board/export/drawing-sheet";
import { svgMarkup } from "./svg-markup";

// The schematic as the printed drawing sheet's SVG text (the board's symbols, flow red and
// return blue), for the handover report's PDF page and its HTML print view.

export function drawingSvg(doc: Schematic, title: TitleBlock): string {
  return svgMarkup(createElement(DrawingSheet, { doc, title, tags: "label" }));
}
