import fs from "node:fs";
import path from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { parseSchematic } from "@/lib/schematic";
import { DrawingSheet } from "./drawing-sheet";

const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
const parsed = parseSchematic(raw);
if (!parsed.ok) throw new Error("seed refused");
const doc = parsed.doc;
const title = { project: "Orchard End", schematic: "Bypass only", revision: "Rev 1", status: "In review", date: "12 December 2026" };
const svg = (tags: "label" | "id" = "label") => renderToStaticMarkup(createElement(DrawingSheet, { doc, title, tags }));

describe("drawing sheet (print, SVG and PNG export)", () => {
  it("is one SVG with every part and pipe and the title block's five lines", () => {
    const out = svg();
    expect(out.startsWith("<svg")).toBe(true);
    expect(out.match(/data-part="/g)).toHaveLength(doc.parts.length);
    expect(out.match(/data-pipe="/g)).toHaveLength(doc.pipes.length);
    for (const [k, v] of Object.entries({ Project: "Orchard End", Schematic: "Bypass only", Revision: "Rev 1", Status: "In review", Date: "12 December 2026" })) {
      expect(out).toMatch(new RegExp(`${k}: </tspan><tspan[^>]*>${v}</tspan>`));
    }
    expect(out).toContain("competent person");
  });
  it("captions pipes with size and length, and tags parts with labels or ids", () => {
    expect(svg()).toContain(">28 · 4 m<");
    expect(svg("label")).toContain(">Lounge<");
    expect(svg("id")).toContain(">rad-lounge<");
    expect(svg("id")).not.toContain(">Lounge<");
    // tees are named by id only: their labels would crowd the runs
    expect(svg("label")).not.toContain(">Tee, Lounge flow<");
    expect(svg("id")).toContain(">z1-tf1<");
  });
  it("keeps the whole drawing inside the sheet", () => {
    const out = svg();
    const [x, y, w, h] = out.match(/viewBox="([^"]+)"/)![1]!.split(" ").map(Number) as [number, number, number, number];
    for (const p of doc.parts) {
      expect(p.x).toBeGreaterThan(x);
      expect(p.x).toBeLessThan(x + w);
      expect(p.y).toBeGreaterThan(y);
      expect(p.y).toBeLessThan(y + h);
    }
  });
});
