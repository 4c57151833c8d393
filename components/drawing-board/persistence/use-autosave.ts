"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { autosaveDraft } from "@/components/drawing-board/actions";
import { actionErrorMessage } from "@/lib/action-error";
import { useBoardStore } from "../store";

export type SaveStatus = "saved" | "unsaved" | "saving" | "conflict" | "error";
export const AUTOSAVE_DELAY_MS = 1500;

/**
 * Debounced autosave of the working draft: every document change (the store's
 * `revision` counter) restarts a 1.5 s timer; when it fires the current doc is
 * sent with the lock version we last saw. A stale lock version stops autosave
 * and reports "conflict" so nothing is overwritten; the dialog decides.
 */
export function useAutosave(schematicId: string, initialLockVersion: number, enabled: boolean) {
  const store = useBoardStore();
  const [status, setStatus] = useState<SaveStatus>("saved");
  const [error, setError] = useState<string | null>(null);
  const lock = useRef(initialLockVersion);
  const savedRevision = useRef(store.getState().revision);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const halted = useRef(false);
  const saveRef = useRef<() => Promise<void>>(async () => {});

  const schedule = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void saveRef.current(), AUTOSAVE_DELAY_MS);
  }, []);

  const save = useCallback(async () => {
    if (inFlight.current || halted.current) return;
    const { doc, revision } = store.getState();
    if (revision === savedRevision.current) return setStatus("saved");
    inFlight.current = true;
    setStatus("saving");
    try {
      const r = await autosaveDraft({ schematicId, lockVersion: lock.current, doc });
      if (r.ok) {
        lock.current = r.data.lockVersion;
        savedRevision.current = revision;
        setError(null);
        setStatus(store.getState().revision === revision ? "saved" : "unsaved");
      } else {
        halted.current = r.status === 409 && "currentLockVersion" in r;
        setError(r.error);
        setStatus(halted.current ? "conflict" : "error");
      }
    } catch (e) {
      setError(actionErrorMessage(e, "Could not reach the server; your changes are kept here and will be saved when it answers."));
      setStatus("error");
    } finally {
      inFlight.current = false;
    }
    if (!halted.current && store.getState().revision !== savedRevision.current) schedule();
  }, [schematicId, store, schedule]);
  saveRef.current = save;

  useEffect(() => {
    if (!enabled) return;
    const unsubscribe = store.subscribe((s, prev) => {
      if (s.revision === prev.revision || halted.current) return;
      setStatus("unsaved");
      schedule();
    });
    return () => {
      unsubscribe();
      if (timer.current) clearTimeout(timer.current);
    };
  }, [enabled, store, schedule]);

  // Leaving with unsaved changes asks first (the browser shows its own wording).
  useEffect(() => {
    if (status === "saved") return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [status]);

  /** After a revision save (which also writes the draft): adopt its lock version. */
  const markSaved = useCallback((lockVersion: number, revision = store.getState().revision) => {
    lock.current = lockVersion;
    savedRevision.current = revision;
    setStatus(store.getState().revision === revision ? "saved" : "unsaved");
  }, [store]);

  return { status, error, lockVersion: () => lock.current, markSaved, flush: save };
}
