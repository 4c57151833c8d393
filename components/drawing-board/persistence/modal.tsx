"use client";

import { useEffect, useRef, type ReactNode } from "react";

/** A native <dialog> shown modally while `open`; Escape calls onClose (unless it is required). */
export function Modal({ open, title, onClose, children, testId }: {
  open: boolean; title: string; onClose?: () => void; children: ReactNode; testId?: string;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog ref={ref} data-testid={testId} aria-labelledby={`${testId ?? "modal"}-title`}
      onCancel={(e) => { e.preventDefault(); onClose?.(); }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-ink/10 bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/30">
      <div className="p-5">
        <h2 id={`${testId ?? "modal"}-title`} className="text-lg font-semibold">{title}</h2>
        <div className="mt-3 text-sm">{children}</div>
      </div>
    </dialog>
  );
}
