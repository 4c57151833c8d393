"use client";
import type { ReactNode } from "react";
import { useBoard } from "./store";

const btn = "rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-paper-dark hover:text-ink disabled:opacity-40 disabled:hover:bg-transparent";

/** Name, undo/redo, board-2's slots (revision status, Size it), help, and the phone toggles. */
export function BoardTopBar(props: {
  toolbarSlot?: ReactNode;
  onHelp(): void;
  onToggleBin(): void;
  onToggleDetails(): void;
  tab: "drawing" | "report";
  onTab?: (t: "drawing" | "report") => void;
}) {
  const name = useBoard((s) => s.doc.name);
  const canUndo = useBoard((s) => s.past.length > 0 && !s.readOnly);
  const canRedo = useBoard((s) => s.future.length > 0 && !s.readOnly);
  const readOnly = useBoard((s) => s.readOnly);
  const dispatch = useBoard((s) => s.dispatch);
  const showDesign = useBoard((s) => s.showDesign);
  return (
    <div className="flex flex-wrap items-center gap-1 border-b border-ink/10 bg-white px-2 py-1.5">
      {!readOnly && <button type="button" className={`${btn} md:hidden`} onClick={props.onToggleBin} aria-label="Parts bin">Parts</button>}
      <h1 className="mr-2 max-w-[40vw] truncate text-sm font-semibold text-ink" title={name}>{name || "Untitled schematic"}</h1>
      {readOnly && <span className="rounded bg-paper-dark px-1.5 py-0.5 text-xs text-ink-soft">read-only</span>}
      <button type="button" className={btn} disabled={!canUndo} onClick={() => dispatch("undo")} title="Undo (Ctrl/⌘+Z)" aria-label="Undo">↶ Undo</button>
      <button type="button" className={btn} disabled={!canRedo} onClick={() => dispatch("redo")} title="Redo (Ctrl/⌘+Shift+Z)" aria-label="Redo">↷ Redo</button>
      <button type="button" className={btn} onClick={() => showDesign()} data-testid="open-design" aria-label="Design conditions">
        <span className="sm:hidden">Design</span><span className="hidden sm:inline">Design conditions</span>
      </button>
      {props.onTab && (
        <div className="ml-2 flex rounded-md border border-ink/10 p-0.5 text-sm" role="tablist">
          {(["drawing", "report"] as const).map((t) => (
            <button key={t} role="tab" aria-selected={props.tab === t} type="button" onClick={() => props.onTab?.(t)}
              className={`rounded px-2 py-0.5 ${props.tab === t ? "bg-copper-50 text-copper-700" : "text-ink-soft"}`}>
              {t === "drawing" ? "Drawing" : "Sizing report"}
            </button>
          ))}
        </div>
      )}
      <div className="ml-auto flex flex-wrap items-center gap-2">{props.toolbarSlot}</div>
      <button type="button" className={btn} onClick={props.onHelp} title="Shortcuts (?)" aria-label="Help">?</button>
      <button type="button" className={`${btn} md:hidden`} onClick={props.onToggleDetails} aria-label="Details">Details</button>
    </div>
  );
}
