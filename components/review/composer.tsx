"use client";

import { useId, useLayoutEffect, useRef, useState, type KeyboardEvent } from "react";
import { Button } from "@/components/ui/button";
import { MESSAGE_MAX } from "@/lib/review/inputs";
import { mentionQuery } from "@/lib/review/mentions";
import type { Person } from "@/lib/review/types";

/**
 * A message box with an @mention picker: typing "@" and a few letters lists the people
 * who may read the thread; picking one (click, or Enter / Tab) writes "@Their Name ".
 * Ctrl/⌘+Enter sends. The server's refusal (naming the field) is shown under the box.
 */
export function Composer(props: { people: Person[]; label: string; submitLabel: string; initial?: string; autoFocus?: boolean;
  onSubmit(body: string): Promise<string | null>; onCancel?(): void; testId?: string }) {
  const [text, setText] = useState(props.initial ?? "");
  const [caret, setCaret] = useState(0);
  const [active, setActive] = useState(0);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const box = useRef<HTMLTextAreaElement>(null);
  const placeCaret = useRef<number | null>(null);
  const id = useId();
  const q = mentionQuery(text, caret);
  const matches = q ? props.people.filter((p) => p.name.toLowerCase().includes(q.query.toLowerCase())).slice(0, 6) : [];

  const pick = (p: Person) => {
    if (!q) return;
    const next = `${text.slice(0, q.start)}@${p.name} ${text.slice(caret)}`;
    const at = q.start + p.name.length + 2;
    setText(next);
    setCaret(at);
    placeCaret.current = at;
  };
  // after the picked name is written, before the next key is read: the caret goes after it
  // (set later, a fast typist's next letters would land before it)
  useLayoutEffect(() => {
    const at = placeCaret.current;
    if (at === null) return;
    placeCaret.current = null;
    box.current?.focus();
    box.current?.setSelectionRange(at, at);
  });
  const send = async () => {
    if (!text.trim()) return setError("Write something first: the message is empty.");
    setBusy(true);
    const err = await props.onSubmit(text);
    setBusy(false);
    setError(err);
    if (!err) setText("");
  };
  const onKey = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (matches.length > 0 && (e.key === "ArrowDown" || e.key === "ArrowUp")) {
      e.preventDefault();
      setActive((a) => (a + (e.key === "ArrowDown" ? 1 : matches.length - 1)) % matches.length);
    } else if (matches.length > 0 && (e.key === "Enter" || e.key === "Tab") && !e.ctrlKey && !e.metaKey) {
      e.preventDefault();
      pick(matches[Math.min(active, matches.length - 1)]!);
    } else if (e.key === "Enter" && (e.ctrlKey || e.metaKey)) {
      e.preventDefault();
      void send();
    } else if (e.key === "Escape" && props.onCancel) {
      e.stopPropagation();
      props.onCancel();
    }
  };

  return (
    <form onSubmit={(e) => { e.preventDefault(); void send(); }} data-testid={props.testId ?? "composer"}>
      <label htmlFor={id} className="sr-only">{props.label}</label>
      <textarea id={id} ref={box} rows={3} value={text} autoFocus={props.autoFocus} placeholder={`${props.label} — @ to mention someone`}
        onChange={(e) => { setText(e.target.value); setCaret(e.target.selectionStart); setActive(0); }}
        onSelect={(e) => setCaret(e.currentTarget.selectionStart)} onKeyDown={onKey}
        aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-err` : undefined}
        className="w-full resize-y rounded-md border border-ink/15 bg-white p-2 text-sm focus:outline-2 focus:outline-copper-500" />
      {matches.length > 0 && (
        <ul role="listbox" aria-label="Mention someone" className="mt-0.5 rounded-md border border-ink/10 bg-white py-1 text-sm shadow-md" data-testid="mention-picker">
          {matches.map((p, i) => (
            <li key={p.id} role="option" aria-selected={i === active}>
              <button type="button" onMouseDown={(e) => { e.preventDefault(); pick(p); }}
                className={`w-full px-2 py-1 text-left ${i === active ? "bg-copper-50 text-copper-700" : "hover:bg-paper-dark"}`}>@{p.name}</button>
            </li>
          ))}
        </ul>
      )}
      {error && <p id={`${id}-err`} role="alert" className="mt-1 text-xs text-fault">{error}</p>}
      <div className="mt-1 flex items-center justify-end gap-2">
        {text.length > MESSAGE_MAX * 0.9 && <span className="num mr-auto text-xs text-ink-faint">{text.length} / {MESSAGE_MAX}</span>}
        {props.onCancel && <Button type="button" variant="ghost" className="px-2 py-1 text-xs" onClick={props.onCancel}>Cancel</Button>}
        <Button type="submit" className="px-2 py-1 text-xs" disabled={busy}>{busy ? "Sending…" : props.submitLabel}</Button>
      </div>
    </form>
  );
}
