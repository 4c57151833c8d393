"use client";

import { useState } from "react";
import { DrawingSheet, type TitleBlock } from "../export/drawing-sheet";
import { downloadPng, downloadSvg, fileStem, printSheet, sheetMarkup } from "../export/export-drawing";
import { useBoardStore } from "../store";
import { useBoardSession } from "./session-context";

const statusWords: Record<string, string> = { draft: "Draft", "in-review": "In review", approved: "Approved", issued: "Issued for construction" };

/** Print or export the drawing as SVG or PNG, with a title block saying what it is (the open revision, or the working draft). */
export function ExportMenu() {
  const session = useBoardSession();
  const store = useBoardStore();
  const [error, setError] = useState<string | null>(null);
  const title = (): TitleBlock => {
    const v = session.viewing;
    const latest = session.revisions[0];
    return {
      project: session.projectName,
      schematic: session.name,
      revision: v.kind === "revision" ? `Rev ${v.revision.number}` : latest ? `Working draft after Rev ${latest.number}` : "Working draft (no revision yet)",
      status: v.kind === "revision" ? statusWords[v.revision.status] ?? v.revision.status : "Draft: not for construction",
      date: new Date().toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" }),
    };
  };
  const run = async (kind: "svg" | "png" | "print") => {
    setError(null);
    const t = title();
    const { doc, tagMode } = store.getState();
    const markup = sheetMarkup(<DrawingSheet doc={doc} title={t} tags={tagMode} />);
    const stem = fileStem(t.project, t.schematic, t.revision);
    try {
      if (kind === "svg") downloadSvg(markup, `${stem}.svg`);
      else if (kind === "png") await downloadPng(markup, `${stem}.png`);
      else printSheet(markup, `${t.project} — ${t.schematic} — ${t.revision}`);
    } catch (e) {
      setError((e as Error).message);
    }
  };
  const item = "block w-full rounded px-3 py-1.5 text-left text-sm hover:bg-paper-dark";
  return (
    <details className="relative" data-testid="export-menu">
      <summary className="cursor-pointer list-none rounded-md border border-ink/15 bg-white px-2 py-1 text-xs text-ink hover:bg-paper-dark">Export ▾</summary>
      <div className="absolute right-0 z-30 mt-1 w-44 rounded-md border border-ink/10 bg-white p-1 shadow-lg">
        <button type="button" className={item} onClick={() => run("print")}>Print…</button>
        <button type="button" className={item} onClick={() => run("svg")} data-testid="export-svg">Drawing as SVG</button>
        <button type="button" className={item} onClick={() => run("png")} data-testid="export-png">Drawing as PNG</button>
        {error && <p role="alert" className="px-3 py-1 text-xs text-fault">{error}</p>}
      </div>
    </details>
  );
}
