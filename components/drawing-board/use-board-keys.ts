"use client";
/**
 * Window-level shortcuts for the board, ignored while typing in a field.
 * Copy also writes the selection as JSON to the system clipboard (other tabs
 * can paste it); paste prefers that JSON, validated, and falls back to the
 * board's own clipboard (headless browsers and denied permissions).
 */
import { useEffect } from "react";
import { useReactFlow } from "@xyflow/react";
import { parseClipboard } from "./commands";
import { keyTarget, type ViewAction } from "./keymap";
import { useBoardStore } from "./store";

const typing = (el: EventTarget | null) =>
  el instanceof HTMLElement && (el.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(el.tagName));

export function useBoardKeys(onView: (a: ViewAction) => void) {
  const store = useBoardStore();
  const flow = useReactFlow();
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typing(e.target) || e.defaultPrevented) return;
      const target = keyTarget(e);
      if (!target) return;
      e.preventDefault();
      if ("view" in target) {
        if (target.view === "fit-view") void flow.fitView({ padding: 0.1, duration: 200, includeHiddenNodes: true });
        else onView(target.view);
        return;
      }
      const s = store.getState();
      if (target.command === "copy") {
        s.dispatch("copy");
        const clip = store.getState().clipboard;
        if (clip) navigator.clipboard?.writeText(JSON.stringify(clip)).catch(() => undefined);
        return;
      }
      if (target.command === "paste") {
        const read = navigator.clipboard?.readText?.() ?? Promise.reject(new Error("no clipboard"));
        read
          .then((text) => parseClipboard(text))
          .catch(() => null)
          .then((clip) => store.getState().dispatch("paste", clip ? { clipboard: clip } : undefined));
        return;
      }
      s.dispatch(target.command as never, undefined as never);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [store, flow, onView]);
}
