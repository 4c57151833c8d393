"use client";
/**
 * The project page's way in: tick two designs (a working draft or a revision), then
 * Compare. Ticking a third lets go of the first ticked.
 */
import Link from "next/link";
import { createContext, useContext, useState, type ReactNode } from "react";
import { compareHref } from "@/lib/compare/refs";
import { buttonClass } from "@/components/ui/button";

type Ticked = { ref: string; label: string }[];
const TickContext = createContext<{ ticked: Ticked; toggle: (t: Ticked[number]) => void } | null>(null);

export function CompareTicks({ projectId, children }: { projectId: string; children: ReactNode }) {
  const [ticked, setTicked] = useState<Ticked>([]);
  const toggle = (t: Ticked[number]) =>
    setTicked((xs) => (xs.some((x) => x.ref === t.ref) ? xs.filter((x) => x.ref !== t.ref) : [...xs, t].slice(-2)));
  const [a, b] = ticked;
  return (
    <TickContext.Provider value={{ ticked, toggle }}>
      {children}
      <div className="sticky bottom-3 z-10 mt-4 flex flex-wrap items-center gap-2 rounded-lg border border-copper-100 bg-white/95 px-3 py-2 text-sm shadow-md" data-testid="compare-tray">
        <span className="text-ink-soft">
          {ticked.length === 0 ? "Tick two designs to see them side by side." : ticked.length === 1 ? <>Ticked <b>{a!.label}</b>; tick one more.</> : <>A: <b>{a!.label}</b> · B: <b>{b!.label}</b></>}
        </span>
        <span className="ml-auto flex gap-2">
          {ticked.length > 0 && <button type="button" className={buttonClass("ghost", "px-2 py-1")} onClick={() => ticked.forEach(toggle)}>Clear</button>}
          {a && b ? <Link href={compareHref(projectId, a.ref, b.ref)} className={buttonClass("primary", "px-3 py-1.5")} data-testid="compare-ticked">Compare side by side</Link>
            : <Link href={compareHref(projectId, a?.ref)} className={buttonClass("secondary", "px-3 py-1.5")}>Choose…</Link>}
        </span>
      </div>
    </TickContext.Provider>
  );
}

/** A tick box for one design; renders nothing outside CompareTicks (a role that may not compare). */
export function CompareTick({ designRef, label, text = "compare" }: { designRef: string; label: string; text?: string }) {
  const ctx = useContext(TickContext);
  if (!ctx) return null;
  const on = ctx.ticked.some((t) => t.ref === designRef);
  return (
    <label className="inline-flex cursor-pointer items-center gap-1 text-xs text-ink-soft" title="Tick two to compare them side by side">
      <input type="checkbox" checked={on} onChange={() => ctx.toggle({ ref: designRef, label })} className="accent-copper-500" data-testid="compare-tick" data-ref={designRef} />
      {text}
    </label>
  );
}
