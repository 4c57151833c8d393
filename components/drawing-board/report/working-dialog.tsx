"use client";

import { Modal } from "../persistence/modal";
import { Button } from "@/components/ui/button";
import type { Working } from "./working";

/** Formula, inputs, answer and source of one number in the report. */
export function WorkingDialog({ working, onClose }: { working: Working | null; onClose: () => void }) {
  return (
    <Modal open={working !== null} title={working?.title ?? ""} onClose={onClose} testId="working-dialog">
      {working && (
        <>
          <p className="num rounded bg-paper-dark px-2 py-1.5 text-sm">{working.formula}</p>
          <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1">
            {working.inputs.map((i) => (
              <div key={i.label} className="contents">
                <dt className="text-ink-soft">{i.label}</dt>
                <dd className="num text-right">{i.value}</dd>
              </div>
            ))}
            <dt className="mt-1 border-t border-ink/10 pt-1 font-medium">result</dt>
            <dd className="num mt-1 border-t border-ink/10 pt-1 text-right font-medium">{working.result}</dd>
          </dl>
          <p className="mt-3 text-xs text-ink-faint">Source: {working.source}</p>
          <div className="mt-4 flex justify-end"><Button variant="secondary" onClick={onClose}>Close</Button></div>
        </>
      )}
    </Modal>
  );
}
