"use client";
import { partRegistry, partTypes } from "@/lib/schematic";
import { layoutOf, symbols } from "@/components/drawing-board/parts";

export function SymbolSheet() {
  return (
    <div className="grid grid-cols-[repeat(auto-fill,minmax(220px,1fr))] gap-4 p-4" data-testid="symbol-sheet">
      {partTypes.map((t) => {
        const l = layoutOf(t);
        const S = symbols[t];
        return (
          <figure key={t} className="rounded border border-ink/10 bg-white p-2">
            <div className="flex items-end gap-3">
              {[0.5, 1, 2].map((z) => (
                <svg key={z} width={l.w * z} height={l.h * z} viewBox={`0 0 ${l.w} ${l.h}`} className="overflow-visible text-ink">
                  <S w={l.w} h={l.h} props={{}} />
                </svg>
              ))}
            </div>
            <figcaption className="mt-1 text-xs text-ink-soft">{partRegistry[t].label} <span className="num text-ink-faint">{t}</span></figcaption>
          </figure>
        );
      })}
    </div>
  );
}
