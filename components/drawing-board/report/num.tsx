"use client";

import type { Working } from "./working";

/**
 * A number in a report cell; when it has working, it is a button that opens it.
 * A number resting on typical values (the working's `assumed`) carries a mark.
 */
export function Num({ text, working, onShow, tone }: { text: string; working?: Working | null; onShow?: (w: Working) => void; tone?: "fault" | "warn" | "ok" }) {
  const color = tone === "fault" ? "text-fault" : tone === "warn" ? "text-warn" : tone === "ok" ? "text-ok" : "";
  const mark = working?.assumed?.length ? (
    <sup className="ml-0.5 text-[10px] text-warn" title="Rests on typical values assumed where the drawing gives none — open the working" data-assumed="true">≈</sup>
  ) : null;
  if (!working || !onShow) return <span className={`num ${color}`}>{text}{mark}</span>;
  return (
    <button type="button" onClick={() => onShow(working)} title="Show working" data-working={working.title}
      className={`num underline decoration-copper-300 decoration-dotted underline-offset-2 hover:text-copper-700 ${color}`}>
      {text}{mark}
    </button>
  );
}
