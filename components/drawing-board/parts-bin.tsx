"use client";
/**
 * The parts bin: every part type, grouped as in the schematic registry, with a
 * search box. Drag a part onto the canvas (onto a pipe, a tee or valve goes
 * into it), or click it to place it in the free space nearest the view's centre.
 */
import { useMemo, useState, type DragEvent } from "react";
import { useReactFlow, useStore } from "@xyflow/react";
import { partGroups, partMatches, partRegistry, partTypes, type PartType } from "@/lib/schematic";
import { GRID, PART_MIME } from "./canvas";
import { layoutOf, symbols } from "./parts";
import { freeSpotNear } from "./commands";
import { useBoard, useBoardStore } from "./store";

function Thumb({ type }: { type: PartType }) {
  const l = layoutOf(type);
  const Symbol = symbols[type];
  return (
    <svg viewBox={`-4 -4 ${l.w + 8} ${l.h + 8}`} className="h-8 w-10 shrink-0 text-ink" aria-hidden>
      <Symbol w={l.w} h={l.h} props={{}} />
    </svg>
  );
}

export function PartsBin() {
  const [query, setQuery] = useState("");
  const dispatch = useBoard((s) => s.dispatch);
  const store = useBoardStore();
  const readOnly = useBoard((s) => s.readOnly);
  const flow = useReactFlow();
  const size = useStore((s) => ({ w: s.width, h: s.height }), (a, b) => a.w === b.w && a.h === b.h);
  const groups = useMemo(() => {
    const hit = (t: PartType) => partMatches(t, query);
    return partGroups.map((g) => ({ group: g, types: partTypes.filter((t) => partRegistry[t].group === g && hit(t)) })).filter((g) => g.types.length > 0);
  }, [query]);

  const addAtCentre = (type: PartType) => {
    const { x, y, zoom } = flow.getViewport();
    const cx = (size.w / 2 - x) / zoom;
    const cy = (size.h / 2 - y) / zoom;
    dispatch("add-part", { type, ...freeSpotNear(store.getState().doc, type, cx, cy, GRID) });
  };
  const onDragStart = (e: DragEvent, type: PartType) => {
    e.dataTransfer.setData(PART_MIME, type);
    e.dataTransfer.effectAllowed = "copy";
  };

  return (
    <div className="flex h-full flex-col" data-testid="parts-bin">
      <div className="border-b border-ink/10 p-2">
        <h2 className="px-1 pb-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Parts bin</h2>
        <input type="search" value={query} onChange={(e) => setQuery(e.target.value)} placeholder="Search parts" aria-label="Search parts"
          className="w-full rounded-md border border-ink/15 bg-white px-2 py-1.5 text-sm outline-none focus:border-copper-500" />
      </div>
      <div className="flex-1 overflow-y-auto p-2">
        {groups.map(({ group, types }) => (
          <section key={group} className="mb-3">
            <h3 className="px-1 pb-1 text-[11px] font-medium uppercase tracking-wide text-ink-faint">{group}</h3>
            <ul className="space-y-0.5">
              {types.map((t) => (
                <li key={t}>
                  <button type="button" draggable={!readOnly} disabled={readOnly} onDragStart={(e) => onDragStart(e, t)} onClick={() => addAtCentre(t)}
                    data-part={t} title={`Drag onto the board, or click to add ${partRegistry[t].label.toLowerCase()}`}
                    className="flex w-full items-center gap-2 rounded-md px-1.5 py-1 text-left text-sm text-ink hover:bg-copper-50 disabled:cursor-default disabled:opacity-50">
                    <Thumb type={t} />
                    <span className="leading-tight">{partRegistry[t].label}</span>
                  </button>
                </li>
              ))}
            </ul>
          </section>
        ))}
        {groups.length === 0 && <p className="px-1 text-sm text-ink-faint">No part matches “{query}”.</p>}
      </div>
    </div>
  );
}
