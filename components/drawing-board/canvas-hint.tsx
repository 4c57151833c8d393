"use client";
import { useEffect } from "react";
import { useBoard } from "./store";

/** The board's one-line message (refused connection, read-only…), cleared after a few seconds. */
export function CanvasHint() {
  const hint = useBoard((s) => s.hint);
  const setHint = useBoard((s) => s.setHint);
  useEffect(() => {
    if (!hint) return;
    const t = setTimeout(() => setHint(null), 3500);
    return () => clearTimeout(t);
  }, [hint, setHint]);
  if (!hint) return null;
  return (
    <div role="status" className="pointer-events-none absolute bottom-4 left-1/2 z-20 -translate-x-1/2 rounded-md border border-warn/40 bg-white px-3 py-1.5 text-sm text-ink shadow" data-testid="canvas-hint">
      {hint}
    </div>
  );
}
