"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useBoard } from "@/components/drawing-board/store";
import type { Thread, ThreadMessage } from "@/lib/review/types";
import { anchorText } from "./anchor-text";
import { Composer } from "./composer";
import { MessageText } from "./message-text";
import { NewThreadButton } from "./new-thread";
import { useReview } from "./review-context";
import { ago } from "./when";

/** One thread: where it is pinned (and whether that is still there), its messages, reply, resolve or reopen. */
export function ThreadView({ t }: { t: Thread }) {
  const r = useReview();
  const doc = useBoard((s) => s.doc);
  const block = r.writeBlock(t.revisionStatus);
  const [error, setError] = useState<string | null>(null);
  const toggle = async () => {
    const out = await r.write("PATCH", `/api/v1/threads/${t.id}`, { resolved: !t.resolved });
    setError(out.ok ? null : out.error);
  };
  return (
    <section className="flex flex-col gap-2 px-2 pb-2 text-sm" data-testid="thread-view" data-thread={t.id} aria-label={`Thread ${t.number}`}>
      <div className="flex items-center gap-2">
        <button type="button" className="text-xs text-copper-700 hover:underline" onClick={() => r.select(null)} data-testid="thread-back">← All threads</button>
        <span className="ml-auto"><NewThreadButton /></span>
      </div>
      <header className="flex items-baseline gap-2">
        <span className={`num rounded-full px-1.5 text-xs font-semibold text-white ${t.resolved ? "bg-ink-faint" : "bg-copper-500"}`}>{t.number}</span>
        <span className="min-w-0 flex-1 font-medium text-ink">
          {t.anchor.kind !== "schematic" && t.anchorPresent
            ? <button type="button" className="text-left hover:underline" onClick={() => r.select(t.id)} title="Show it on the drawing">{anchorText(t.anchor, doc)}</button>
            : anchorText(t.anchor, doc)}
        </span>
        {t.kind === "send-back" && <span className="rounded bg-warn/15 px-1 text-[10px] font-semibold uppercase text-warn">sent back</span>}
        <span className="text-xs text-ink-faint">Rev {t.revisionNumber}</span>
      </header>
      {!t.anchorPresent && (
        <p className="rounded bg-paper-dark px-2 py-1 text-xs text-ink-soft" data-testid="anchor-gone">
          The {t.anchor.kind} {t.anchor.id} is not in {r.viewing ? `Rev ${r.viewing.number}` : "the working draft"} any more; the thread stays readable here.
        </p>
      )}
      <ol className="space-y-2">
        {t.messages.map((m) => <Message key={m.id} m={m} mine={m.authorId === r.userId && !block} />)}
      </ol>
      {t.resolved && <p className="text-xs text-ink-soft">Resolved{t.resolvedByName ? ` by ${t.resolvedByName}` : ""}{t.resolvedAt ? `, ${ago(t.resolvedAt)}` : ""}.</p>}
      {block ? <p className="text-xs text-ink-faint">{block}</p> : (
        <>
          <Composer people={r.mentionable} label="Reply" submitLabel="Reply" testId="reply-composer"
            onSubmit={async (body) => {
              const out = await r.write("POST", `/api/v1/threads/${t.id}/replies`, { body });
              return out.ok ? null : out.error;
            }} />
          <div className="flex justify-end">
            <Button variant="secondary" className="px-2 py-1 text-xs" onClick={toggle} data-testid="resolve-thread">{t.resolved ? "Reopen" : "Resolve"}</Button>
          </div>
          {error && <p role="alert" className="text-xs text-fault">{error}</p>}
        </>
      )}
    </section>
  );
}

function Message({ m, mine }: { m: ThreadMessage; mine: boolean }) {
  const r = useReview();
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const remove = async () => {
    if (!window.confirm("Delete this message? Its text goes; the thread keeps its place.")) return;
    const out = await r.write("DELETE", `/api/v1/messages/${m.id}`);
    if (!out.ok) return setError(out.error);
    if (out.thread === null) r.select(null);
  };
  return (
    <li className="rounded-md border border-ink/10 bg-white px-2 py-1.5" data-testid="message" data-message={m.id}>
      <div className="flex items-baseline gap-2 text-xs">
        <span className="font-medium text-ink">{m.authorName ?? "someone"}</span>
        <span className="text-ink-faint">{ago(m.createdAt)}{m.editedAt && !m.deleted ? " · edited" : ""}</span>
        {mine && !m.deleted && !editing && (
          <span className="ml-auto flex gap-2">
            <button type="button" className="text-ink-soft hover:text-ink" onClick={() => setEditing(true)} data-testid="edit-message">Edit</button>
            <button type="button" className="text-ink-soft hover:text-fault" onClick={remove} data-testid="delete-message">Delete</button>
          </span>
        )}
      </div>
      {m.deleted ? <p className="text-xs italic text-ink-faint">message deleted</p> : editing ? (
        <Composer people={r.mentionable} label="Edit message" submitLabel="Save" initial={m.body} autoFocus onCancel={() => setEditing(false)}
          onSubmit={async (body) => {
            const out = await r.write("PATCH", `/api/v1/messages/${m.id}`, { body });
            if (out.ok) setEditing(false);
            return out.ok ? null : out.error;
          }} />
      ) : <MessageText text={m.body} className="mt-0.5 text-sm text-ink" />}
      {error && <p role="alert" className="text-xs text-fault">{error}</p>}
    </li>
  );
}
