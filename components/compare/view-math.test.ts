import { describe, expect, it } from "vitest";
import { centreOn, fitViewport, itemPoint, zoomAbout } from "./view-math";

// The shared view of the two canvases: a point in the drawing lands at x·zoom + vx on screen.
const onScreen = (v: { x: number; y: number; zoom: number }, p: { x: number; y: number }) => ({ x: p.x * v.zoom + v.x, y: p.y * v.zoom + v.y });

describe("view math", () => {
  it("fits a box inside the pane with its margin, centred", () => {
    const v = fitViewport({ x0: 100, y0: 50, x1: 1100, y1: 550 }, { width: 600, height: 400 }, 0.05);
    expect(v.zoom).toBeCloseTo(0.54, 12); // 600·0.9 / 1000
    expect(onScreen(v, { x: 600, y: 300 })).toEqual({ x: 300, y: 200 });
  });
  it("never fits above 150 %", () => {
    expect(fitViewport({ x0: 0, y0: 0, x1: 10, y1: 10 }, { width: 600, height: 400 }).zoom).toBe(1.5);
  });
  it("zooms about the pane's centre", () => {
    const size = { width: 600, height: 400 };
    const v = { x: 20, y: -30, zoom: 0.5 };
    const centre = { x: (300 - v.x) / v.zoom, y: (200 - v.y) / v.zoom };
    const z = zoomAbout(v, 2, size);
    expect(z.zoom).toBe(1);
    expect(onScreen(z, centre)).toEqual({ x: 300, y: 200 });
  });
  it("centres on a part, or between a pipe's end parts", () => {
    const doc = {
      parts: [{ id: "a", x: 0, y: 0 }, { id: "b", x: 200, y: 100 }],
      pipes: [{ id: "p", from: "a.out", to: "b.in" }],
    } as never;
    expect(itemPoint(doc, "p")).toEqual({ x: 100, y: 50 });
    expect(itemPoint(doc, "zz")).toBeNull();
    const v = centreOn({ x: 100, y: 50 }, { width: 600, height: 400 }, 0.3);
    expect(v.zoom).toBe(1);
    expect(onScreen(v, { x: 100, y: 50 })).toEqual({ x: 300, y: 200 });
  });
});
