"use client";
import { useEffect, useMemo, useState } from "react";
import type { SiteSheet } from "@/lib/site/site-view";
import { CommissioningForm } from "./commissioning-form";
import { DrawingView } from "./drawing-view";
import { Caution } from "./field";
import { FillForm } from "./fill-form";
import { useSiteData } from "./offline/use-site-data";
import { OfflineShell } from "./offline/offline-shell";
import { shownTicks } from "./overlay";
import { PhotosPanel } from "./photos-panel";
import { PressureTestForm } from "./pressure-test-form";
import { Notes } from "./notes";
import { CheckedRecords, PressureRecords } from "./records-list";
import { RuleEditor } from "./rule-editor";
import { SheetList } from "./sheet-list";
import { SyncStatus } from "./sync-status";

const tabs = [["sheet", "Sheet"], ["drawing", "Drawing"], ["tests", "Tests"], ["readings", "Readings"], ["photos", "Photos"]] as const;
type Tab = (typeof tabs)[number][0];

/** The site sheet on a phone: the issued design by circuit, its drawing, the test and commissioning logs, photos — offline too. */
export function SiteSheetApp({ initial }: { initial: SiteSheet }) {
  const data = useSiteData(initial);
  const { sheet, items } = data;
  const [tab, setTab] = useState<Tab>("sheet");
  const [highlight, setHighlight] = useState<string | null>(null);
  const [drawingFocus, setDrawingFocus] = useState<string | null>(null);
  const [cameFrom, setCameFrom] = useState<string | null>(null);
  const [pinTo, setPinTo] = useState<string | null>(null);
  const [corrects, setCorrects] = useState<string | null>(null);
  const ticks = useMemo(() => shownTicks(sheet.ticks, items, sheet.me.name), [sheet.ticks, items, sheet.me.name]);

  useEffect(() => { // a jump from the drawing brings its row into view; another tab opens at its top
    if (tab === "sheet" && highlight) document.getElementById(`row-${highlight}`)?.scrollIntoView({ block: "start" });
    else if (tab !== "sheet") window.scrollTo({ top: 0 });
  }, [tab, highlight]);

  const save = (kind: "pressure-test" | "fill" | "commissioning") => async (d: unknown) => {
    await data.record(kind, null, d);
    if (kind === "pressure-test") setCorrects(null);
  };

  return (
    <OfflineShell>
      <div className="mx-auto max-w-3xl pb-24" data-testid="site-sheet" data-served-at={initial.asOf}>
        <div className="sticky top-14 z-20 border-b border-ink/15 bg-paper">
          <h1 className="truncate px-3 pt-2 text-base font-bold">{sheet.project.name} · {sheet.schematic.name}</h1>
          <div className="flex flex-wrap items-center justify-between gap-x-2 gap-y-1 px-3">
            <p className="text-sm text-ink">Site sheet · Rev {sheet.revision.number} (issued)</p>
            <SyncStatus link={data.link} sending={data.sending} items={items} onRetry={() => void data.sync()} onDismiss={(seq) => void data.dismiss(seq)} />
          </div>
          <nav className="mt-1 grid grid-cols-5" aria-label="Site sheet" role="tablist">
            {tabs.map(([id, label]) => (
              <button key={id} type="button" role="tab" onClick={() => setTab(id)} aria-selected={tab === id}
                className={`min-h-12 border-b-4 text-sm font-semibold ${tab === id ? "border-copper-600 text-ink" : "border-transparent text-ink-soft"}`}>
                {label}
              </button>
            ))}
          </nav>
        </div>

        {tab === "sheet" && (
          <>
            <div className="px-3 pt-3"><Caution>{sheet.cautions.general}</Caution></div>
            <SheetList sheet={sheet} ticks={ticks} highlight={highlight}
              onToggle={(id) => void data.record(ticks[id]?.ticked ? "untick" : "tick", id, {})}
              onDrawing={(id) => { setDrawingFocus(id); setCameFrom(id); setTab("drawing"); }}
              onPhoto={(id) => { setPinTo(id); setTab("photos"); }} />
          </>
        )}
        {tab === "drawing" && (
          <DrawingView sheet={sheet} ticks={ticks} focus={drawingFocus}
            onPick={(id) => { setHighlight(id); setDrawingFocus(id); setTab("sheet"); }}
            onBack={cameFrom ? () => { setHighlight(cameFrom); setTab("sheet"); } : null} />
        )}
        {tab === "tests" && (
          <div className="space-y-4 py-2">
            {sheet.me.mayRecord && <PressureTestForm sheet={sheet} corrects={corrects} onSave={save("pressure-test")} />}
            {sheet.me.role === "owner" && <div className="px-3"><RuleEditor projectId={sheet.project.id} rule={sheet.rules.pressureTest} onSaved={() => void data.sync()} /></div>}
            <h2 className="px-3 text-lg font-bold">Pressure tests</h2>
            <PressureRecords sheet={sheet} items={items} onCorrect={(id) => { setCorrects(id); window.scrollTo({ top: 0 }); }} />
            {sheet.me.mayRecord && <FillForm sheet={sheet} onSave={save("fill")} />}
            <h2 className="px-3 text-lg font-bold">Flush and fill records</h2>
            <CheckedRecords sheet={sheet} items={items} kind="fill" />
            <Notes sheet={sheet} items={items} onSave={(target, d) => data.record("note", target, d)} />
          </div>
        )}
        {tab === "readings" && (
          <div className="space-y-4 py-2">
            {sheet.me.mayRecord && <CommissioningForm sheet={sheet} onSave={save("commissioning")} />}
            <h2 className="px-3 text-lg font-bold">Commissioning records</h2>
            <CheckedRecords sheet={sheet} items={items} kind="commissioning" />
          </div>
        )}
        {tab === "photos" && <PhotosPanel sheet={sheet} items={items} attachments={data.attachments} pinTo={pinTo} onAdd={data.addPhoto} />}
      </div>
    </OfflineShell>
  );
}
