import fs from "node:fs";
import path from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { parseSchematic } from "@/lib/schematic";
import { DrawingSheet } from "@/components/drawing-board/export/drawing-sheet";
import { svgMarkup } from "./svg-markup";

// The route handlers' SVG writer against react-dom/server (allowed here, outside Next), on
// every demo drawing: the same markup, byte for byte.
const title = { project: "P & Q <test>", schematic: "S", revision: "Revision 1", status: "issued", date: "2026-12-02" };

describe("svgMarkup", () => {
  for (const file of ["millbrook-hall.json", "orchard-end-bypass-only.json", "orchard-end-buffer-40l.json"]) {
    it(`writes the drawing sheet of ${file} as react-dom/server does`, () => {
      const parsed = parseSchematic(JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data", file), "utf8")));
      if (!parsed.ok) throw new Error("seed refused");
      const el = createElement(DrawingSheet, { doc: parsed.doc, title, tags: "label" });
      const a = svgMarkup(el);
      const b = renderToStaticMarkup(el);
      const at = [...a].findIndex((c, i) => c !== b[i]);
      // where they first differ, if anywhere (short, readable failure)
      expect(at === -1 && a.length === b.length ? "" : `${a.slice(Math.max(0, at - 60), at + 60)}\n---\n${b.slice(Math.max(0, at - 60), at + 60)}`).toBe("");
    });
  }
});
