"use client";

import { useLive } from "./live-board";

const words = { connecting: "connecting…", live: "live", reconnecting: "reconnecting…", closed: "not live: reload the page" } as const;

/** Who else is looking at this board (initials), and whether the board is live. */
export function PresenceDots() {
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
      {others.length > 0 && <span className="sr-only">{others.map((p) => p.name).join(", ")} also looking</span>}
    </span>
  );
}
