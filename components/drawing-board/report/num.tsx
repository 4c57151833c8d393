"use client";

import type { Working } from "./working";

/** A number in a report cell; when it has working, it is a button that opens it. */
export function Num({ text, working, onShow, tone }: { text: string; working?: Working | null; onShow?: (w: Working) => void; tone?: "fault" | "warn" | "ok" }) {
  const color = tone === "fault" ? "text-fault" : tone === "warn" ? "text-warn" : tone === "ok" ? "text-ok" : "";
  if (!working || !onShow) return <span className={`num ${color}`}>{text}</span>;
  return (
    <button type="button" onClick={() => onShow(working)} title="Show working"
      className={`num underline decoration-copper-300 decoration-dotted underline-offset-2 hover:text-copper-700 ${color}`}>
      {text}
    </button>
  );
}
