"use client";

import { useEffect, useState } from "react";
import { createPortal } from "react-dom";
import { HEADER_SLOT } from "@/components/shell/app-header";
import { useLive } from "./live-board";

const words = { connecting: "connecting…", live: "live", reconnecting: "reconnecting…", closed: "not live: reload the page" } as const;

/** Who else is looking at this board (initials) and whether it is live, in the app's top bar (beside the board's when there is none). */
export function PresenceDots() {
  // undefined until mounted (the header is found in the page's DOM)
  const [slot, setSlot] = useState<HTMLElement | null | undefined>(undefined);
  useEffect(() => setSlot(document.getElementById(HEADER_SLOT)), []);
  if (slot === undefined) return null;
  return slot ? createPortal(<Dots />, slot) : <Dots />;
}

function Dots() {
  const live = useLive();
  if (!live) return null;
  const others = live.presence.filter((p) => p.userId !== live.you);
  return (
    <span className="flex items-center gap-1" data-testid="presence" data-state={live.state}>
      <span className={`h-2 w-2 rounded-full ${live.state === "live" ? "bg-ok" : live.state === "closed" ? "bg-fault" : "bg-warn"}`}
        title={`Board ${words[live.state]}`} aria-label={`Board ${words[live.state]}`} />
      {others.map((p) => (
        <span key={p.userId} title={`${p.name} is looking at this board`} data-testid="presence-person"
          className="flex h-6 w-6 items-center justify-center rounded-full bg-copper-100 text-[10px] font-semibold text-copper-700 ring-2 ring-white">
          {p.initials}
        </span>
      ))}
      {others.length > 0 ? <span className="sr-only">{others.map((p) => p.name).join(", ")} also looking</span>
        : <span className="hidden text-xs text-ink-faint sm:inline">only you here</span>}
    </span>
  );
}
