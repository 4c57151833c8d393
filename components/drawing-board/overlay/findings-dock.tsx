"use client";

import { useState } from "react";
import { useBoard } from "../store";
import { FindingsList } from "./findings-list";

/**
 * The findings panel, docked in the right-hand column above the details (never over the
 * drawing). Folds to its header line; folded at first on a phone, where it shares a drawer.
 */
export function FindingsDock() {
  const findings = useBoard((s) => s.results?.findings ?? null);
  const [open, setOpen] = useState(() => typeof window === "undefined" || window.matchMedia("(min-width: 768px)").matches);
  if (findings === null) return null;
  const errors = findings.filter((f) => f.severity === "error").length;
  const warnings = findings.filter((f) => f.severity === "warning").length;
  return (
    <div className={`flex min-h-0 flex-col border-b border-ink/10 ${open ? "max-h-[55%]" : ""}`} data-testid="findings-dock">
      <button type="button" onClick={() => setOpen((o) => !o)} aria-expanded={open}
        className="flex w-full shrink-0 items-center justify-between px-3 py-2 text-left">
        <span className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Findings</span>
        <span className="num text-xs text-ink-faint">
          {errors > 0 && <span className="text-fault">{errors} error{errors === 1 ? "" : "s"} · </span>}
          {warnings} warning{warnings === 1 ? "" : "s"} · {findings.length} in all {open ? "▴" : "▾"}
        </span>
      </button>
      {open && <div className="min-h-0 overflow-y-auto px-1 pb-2"><FindingsList /></div>}
    </div>
  );
}
