"use client";

import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import useSWR from "swr";
import type { ProjectRole } from "@/lib/auth/policy";
import { fetchJson } from "@/lib/fetch-json";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import type { AnchorKind, Person, Thread } from "@/lib/review/types";
import { useLiveMessages } from "./live-board";

export type Anchor = { kind: AnchorKind; id: string | null };
export type ThreadFilter = { state: "open" | "resolved"; mine: boolean };

/** The answer of a write: the thread as it is now, or the server's message (naming the field). */
export type WriteResult = { ok: true; thread: Thread | null } | { ok: false; error: string };

interface ReviewValue {
  schematicId: string;
  userId: string;
  /** The revision opened (its threads up to it), or null for the working draft (all threads). */
  viewing: { id: string; number: number; status: RevisionStatus } | null;
  threads: Thread[];
  mentionable: Person[];
  loadError: string | null;
  selected: string | null;
  select(id: string | null, focus?: boolean): void;
  /** Parts and pipes to bring into view on the drawing (the marker layer acts on it). */
  focus: { ids: string[]; n: number } | null;
  filter: ThreadFilter;
  setFilter(f: ThreadFilter): void;
  composing: Anchor | null;
  compose(a: Anchor | null): void;
  /** The panel: folded or open (beside the drawing), which tab; `sheet`: shown over the drawing on a phone. */
  panel: { open: boolean; tab: "threads" | "history"; sheet: boolean };
  setPanel(p: { open: boolean; tab: "threads" | "history"; sheet: boolean }): void;
  /** Open the panel at a tab (on a phone too). */
  show(tab: "threads" | "history"): void;
  /** Why this person may not write on a revision with this status (null: they may). */
  writeBlock(status: RevisionStatus | null): string | null;
  write(method: "POST" | "PATCH" | "DELETE", url: string, body?: unknown): Promise<WriteResult>;
  refresh(): Promise<unknown>;
}

const ReviewContext = createContext<ReviewValue | null>(null);

export interface ReviewProviderProps {
  schematicId: string;
  userId: string;
  role: ProjectRole;
  schematic: { kind: "team" | "practice"; ownerId: string | null };
  viewing: ReviewValue["viewing"];
  initialThread: string | null;
  children: ReactNode;
}

/** The same rule as the server's (lib/review/access.ts), to hide what would be refused. */
function blockFor(role: ProjectRole, schematic: ReviewProviderProps["schematic"], userId: string, status: RevisionStatus | null): string | null {
  if (status === null) return "Save a revision first: threads are pinned to a saved revision.";
  if (role === "owner" || role === "designer" || role === "reviewer") return null;
  if (role === "installer") return status === "issued" ? null : "Installers write on issued revisions only.";
  return schematic.kind === "practice" && schematic.ownerId === userId ? null : "Trainees write threads on their own practice variants only.";
}

/**
 * The review side of an open board: its threads (kept fresh by live messages, never by
 * polling), which one is open, the list's filter, a thread being started, and the panel.
 */
export function ReviewProvider(p: ReviewProviderProps) {
  const key = `/api/v1/schematics/${p.schematicId}/threads${p.viewing ? `?revision=${p.viewing.number}` : ""}`;
  const { data, error, mutate } = useSWR(key, (u: string) => fetchJson<{ threads: Thread[]; mentionable: Person[] }>(u),
    { revalidateOnFocus: false, revalidateIfStale: false });
  useLiveMessages((m) => { if (m.type === "thread" || m.type === "resync") void mutate(); });
  const [selected, setSelected] = useState<string | null>(p.initialThread);
  const [focus, setFocus] = useState<ReviewValue["focus"]>(null);
  const [filter, setFilter] = useState<ThreadFilter>({ state: "open", mine: false });
  const [composing, compose] = useState<Anchor | null>(null);
  const [panel, setPanel] = useState<ReviewValue["panel"]>({ open: true, tab: "threads", sheet: p.initialThread !== null });
  const threads = useMemo(() => data?.threads ?? [], [data]);

  const select = useCallback((id: string | null, focusIt = true) => {
    setSelected(id);
    const t = threads.find((x) => x.id === id);
    if (t && focusIt && t.anchor.id && t.anchorPresent) setFocus((f) => ({ ids: [t.anchor.id!], n: (f?.n ?? 0) + 1 }));
    if (t?.resolved) setFilter((f) => ({ ...f, state: "resolved" }));
  }, [threads]);

  // an e-mail link names a thread: once the threads are in, show it and bring its part into view
  const landed = useRef(false);
  useEffect(() => {
    if (landed.current || !p.initialThread || !data) return;
    landed.current = true;
    select(p.initialThread);
  }, [data, p.initialThread, select]);

  const write = useCallback(async (method: "POST" | "PATCH" | "DELETE", url: string, body?: unknown): Promise<WriteResult> => {
    try {
      const r = await fetchJson<{ thread: Thread | null }>(url, { method, body: body === undefined ? undefined : JSON.stringify(body) });
      await mutate();
      return { ok: true, thread: r.thread };
    } catch (e) {
      return { ok: false, error: (e as Error).message };
    }
  }, [mutate]);

  const value: ReviewValue = {
    schematicId: p.schematicId, userId: p.userId, viewing: p.viewing, threads, mentionable: data?.mentionable ?? [],
    loadError: error ? (error as Error).message : null, selected, select, focus, filter, setFilter, composing, compose, panel, setPanel,
    show: (tab) => setPanel({ open: true, tab, sheet: true }),
    writeBlock: (status) => blockFor(p.role, p.schematic, p.userId, status), write, refresh: () => mutate(),
  };
  return <ReviewContext.Provider value={value}>{p.children}</ReviewContext.Provider>;
}

export function useReview(): ReviewValue {
  const v = useContext(ReviewContext);
  if (!v) throw new Error("useReview must be used inside <ReviewProvider>");
  return v;
}

/** Mine: I opened it, wrote in it, or was mentioned in it. */
export function isMine(t: Thread, userId: string): boolean {
  return t.createdBy === userId || t.messages.some((m) => m.authorId === userId || m.mentions.includes(userId));
}
