"use client";

import { ReviewDock } from "./review-dock";
import { useReview } from "./review-context";
import { usePhone } from "./use-phone";

/**
 * On a phone the review panel is a sheet from the bottom, opened by a button on the canvas
 * (or a marker); on wider screens this renders nothing (the panel is docked beside the drawing).
 */
export function PhoneReview() {
  const r = useReview();
  const phone = usePhone();
  const open = r.threads.filter((t) => !t.resolved).length;
  if (!phone) return null;
  return (
    <>
      {!r.panel.sheet && (
        <button type="button" onClick={() => r.setPanel({ ...r.panel, sheet: true })} data-testid="phone-threads"
          className="pointer-events-auto absolute bottom-3 right-3 z-20 rounded-full bg-copper-500 px-3 py-1.5 text-sm font-medium text-white shadow-lg">
          Threads{open ? ` · ${open}` : ""}
        </button>
      )}
      {r.panel.sheet && (
        <div className="absolute inset-x-0 bottom-0 z-30 flex max-h-[65%] flex-col rounded-t-xl border-t border-ink/10 bg-paper shadow-2xl" role="dialog" aria-label="Review" data-testid="review-sheet">
          <ReviewDock inSheet onClose={() => r.setPanel({ ...r.panel, sheet: false })} />
        </div>
      )}
    </>
  );
}
