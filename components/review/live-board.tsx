"use client";

import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import type { Present } from "@/lib/review/types";

/** What the board hears (GET /api/v1/schematics/{id}/events, lib/live/stream.ts). */
export type LiveMessage =
  | { type: "thread"; threadId: string; revisionId: string }
  | { type: "revision"; revisionId: string; status: string }
  | { type: "draft"; lockVersion: number; by: string | null }
  /** Reconnected, or the server missed announcements: refetch what is shown. */
  | { type: "resync" };

type Listener = (m: LiveMessage) => void;
export type LiveState = "connecting" | "live" | "reconnecting" | "closed";

interface LiveValue {
  state: LiveState;
  presence: Present[];
  you: string | null;
  subscribe(fn: Listener): () => void;
}

const LiveContext = createContext<LiveValue | null>(null);

/**
 * One EventSource per open board, above the board session so it survives "reload" of the
 * draft. The browser reconnects by itself (after the server's `retry`); each reconnection
 * is followed by a resync, since announcements made while away were missed. No polling.
 */
export function LiveBoard({ schematicId, children }: { schematicId: string; children: ReactNode }) {
  const [state, setState] = useState<LiveState>("connecting");
  const [presence, setPresence] = useState<Present[]>([]);
  const [you, setYou] = useState<string | null>(null);
  const listeners = useRef(new Set<Listener>());

  useEffect(() => {
    const es = new EventSource(`/api/v1/schematics/${schematicId}/events`);
    const emit = (m: LiveMessage) => { for (const fn of listeners.current) fn(m); };
    let opened = false;
    es.onopen = () => {
      setState("live");
      if (opened) emit({ type: "resync" });
      opened = true;
    };
    es.onerror = () => setState(es.readyState === EventSource.CLOSED ? "closed" : "reconnecting");
    const on = (name: string, fn: (data: Record<string, unknown>) => void) =>
      es.addEventListener(name, (e) => fn(JSON.parse((e as MessageEvent<string>).data)));
    on("hello", (d) => {
      setYou(d.you as string);
      // a save made while this board was away is caught up like any other
      if (typeof d.lockVersion === "number") emit({ type: "draft", lockVersion: d.lockVersion, by: null });
    });
    on("presence", (d) => setPresence(d.people as Present[]));
    on("thread", (d) => emit({ type: "thread", threadId: d.threadId as string, revisionId: d.revisionId as string }));
    on("revision", (d) => emit({ type: "revision", revisionId: d.revisionId as string, status: d.status as string }));
    on("draft", (d) => emit({ type: "draft", lockVersion: d.lockVersion as number, by: (d.by as string | null) ?? null }));
    return () => es.close();
  }, [schematicId]);

  const subscribe = useCallback((fn: Listener) => {
    listeners.current.add(fn);
    return () => { listeners.current.delete(fn); };
  }, []);
  const value = useMemo(() => ({ state, presence, you, subscribe }), [state, presence, you, subscribe]);
  return <LiveContext.Provider value={value}>{children}</LiveContext.Provider>;
}

export function useLive(): LiveValue | null {
  return useContext(LiveContext);
}

/** Calls `handler` on every live message (the latest handler; subscribed once). */
export function useLiveMessages(handler: Listener): void {
  const live = useLive();
  const ref = useRef(handler);
  ref.current = handler;
  const subscribe = live?.subscribe;
  useEffect(() => subscribe?.((m) => ref.current(m)), [subscribe]);
}
