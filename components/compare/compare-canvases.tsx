"use client";
/**
 * The two drawings of side by side, one above the other on a phone and side by side
 * wider: one shared view (pan or zoom either, both follow), the differences marked, and
 * "show only what changed".
 */
import { useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { Viewport } from "@xyflow/react";
import type { Schematic } from "@/lib/schematic";
import type { DocDiff } from "@/lib/schematic/doc-diff";
import { drawingBounds } from "@/components/drawing-board/export/drawing-body";
import { markColours, sideMarks } from "./change-marks";
import { ComparePane } from "./compare-pane";
import { boundsOfItems, centreOn, fitViewport, itemPoint, unionBounds, zoomAbout, type Size } from "./view-math";

const btn = "rounded-md border border-ink/15 bg-white px-2 py-1 text-sm text-ink-soft hover:bg-paper-dark hover:text-ink";

export function CompareCanvases({ names, docs, changes, focus }: {
  names: { a: string; b: string }; docs: { a: Schematic; b: Schematic }; changes: DocDiff; focus: { id: string; n: number } | null;
}) {
  const [only, setOnly] = useState(false);
  const bounds = useMemo(() => unionBounds(drawingBounds(docs.a), drawingBounds(docs.b)), [docs]);
  const marks = useMemo(() => ({ a: sideMarks(changes, "a"), b: sideMarks(changes, "b") }), [changes]);
  // one object per comparison: the drawings are memoised and must not redraw on every pan
  const ghost = useMemo(() => ({ doc: docs.a, ids: marks.b.removed.ids, marks: marks.b.removed.marks }), [docs, marks]);
  const pane = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<Size | null>(null);
  const [view, setView] = useState<Viewport | null>(null);

  // measure before the first paint, so the drawings open fitted; follow later resizes (a phone turned)
  useLayoutEffect(() => {
    const el = pane.current;
    if (!el) return;
    const read = () => setSize({ width: el.clientWidth, height: el.clientHeight });
    read();
    const ro = new ResizeObserver(read);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  useLayoutEffect(() => {
    if (size && !view) setView(fitViewport(bounds, size));
  }, [size, view, bounds]);
  useEffect(() => {
    if (!focus || !size) return;
    const at = itemPoint(docs.b, focus.id) ?? itemPoint(docs.a, focus.id);
    if (at) setView((v) => centreOn(at, size, v?.zoom ?? 1));
  }, [focus, size, docs]);

  // the changed items' box: "show only what changed" zooms to it
  const changedBounds = useMemo(() => {
    const measure = (doc: Schematic) => (parts: Schematic["parts"]) => drawingBounds({ ...doc, parts });
    const boxes = [boundsOfItems(docs.a, marks.a.changedIds, measure(docs.a)), boundsOfItems(docs.b, marks.b.changedIds, measure(docs.b)),
      boundsOfItems(docs.a, marks.b.removed.ids, measure(docs.a))].filter((x) => x !== null);
    return boxes.length > 0 ? boxes.reduce(unionBounds) : null;
  }, [docs, marks]);
  const fit = (onlyChanged: boolean) => size && setView(fitViewport(onlyChanged ? changedBounds ?? bounds : bounds, size));
  const shown = view ?? { x: 0, y: 0, zoom: 1 };
  const count = marks.a.changedIds.size + marks.b.changedIds.size + marks.b.removed.ids.size;
  const empty = only && count === 0 ? "No differences to show" : null;
  return (
    <div data-testid="compare-canvases">
      <div className="mb-2 flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={btn} onClick={() => fit(only)} data-testid="compare-fit">Fit</button>
        <button type="button" className={btn} onClick={() => size && setView((v) => zoomAbout(v ?? shown, 1 / 1.25, size))} aria-label="Zoom out">−</button>
        <button type="button" className={btn} onClick={() => size && setView((v) => zoomAbout(v ?? shown, 1.25, size))} aria-label="Zoom in">+</button>
        <span className="num text-xs text-ink-faint" data-testid="compare-zoom">{Math.round(shown.zoom * 100)} %</span>
        <label className="ml-2 inline-flex items-center gap-1.5">
          <input type="checkbox" checked={only} onChange={(e) => { setOnly(e.target.checked); fit(e.target.checked); }} data-testid="compare-only-changed" className="accent-copper-500" />
          Show only what changed
        </label>
        <span className="ml-auto flex flex-wrap items-center gap-3 text-xs text-ink-soft" aria-label="Legend">
          {(["added", "removed", "changed"] as const).map((k) => (
            <span key={k} className="inline-flex items-center gap-1">
              <span className="inline-block h-3 w-3 rounded-sm border-2" style={{ borderColor: markColours[k], background: `${markColours[k]}26` }} />
              {k === "added" ? "added (in B)" : k === "removed" ? "removed (in A; faint in B)" : "changed (both)"}
            </span>
          ))}
        </span>
      </div>
      <div className="grid grid-cols-1 gap-2 md:grid-cols-2">
        {(["a", "b"] as const).map((side) => (
          <div key={side} ref={side === "a" ? pane : undefined} className="h-[40vh] min-h-56 md:h-[58vh] md:min-h-80">
            <ComparePane side={side} name={names[side]} doc={docs[side]} bounds={bounds} marks={marks[side].marks}
              only={only ? marks[side].changedIds : null}
              ghost={side === "b" ? ghost : null} viewport={shown} onViewport={setView} empty={empty} />
          </div>
        ))}
      </div>
    </div>
  );
}
