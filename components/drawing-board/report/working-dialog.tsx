"use client";

import { Modal } from "../persistence/modal";
import { Button } from "@/components/ui/button";
import type { Working, WorkingLine } from "./working";

function Lines({ lines, className = "" }: { lines: WorkingLine[]; className?: string }) {
  return (
    <>
      {lines.map((i) => (
        <div key={i.label} className="contents">
          <dt className={`text-ink-soft ${className}`}>{i.label}</dt>
          <dd className={`num text-right ${className}`}>{i.value}</dd>
        </div>
      ))}
    </>
  );
}

/** Formula, inputs, intermediate values, answer, assumptions and source of one number in the report. */
export function WorkingDialog({ working, onClose }: { working: Working | null; onClose: () => void }) {
  return (
    <Modal open={working !== null} title={working?.title ?? ""} onClose={onClose} testId="working-dialog">
      {working && (
        <>
          <p className="num rounded bg-paper-dark px-2 py-1.5 text-sm">{working.formula}</p>
          <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
            <Lines lines={working.inputs} />
            {working.steps && working.steps.length > 0 && (
              <>
                <dt className="mt-1 border-t border-ink/10 pt-1 text-xs font-medium uppercase tracking-wide text-ink-faint">working</dt>
                <dd className="mt-1 border-t border-ink/10 pt-1" />
                <Lines lines={working.steps} />
              </>
            )}
            <dt className="mt-1 border-t border-ink/10 pt-1 font-medium">result</dt>
            <dd className="num mt-1 border-t border-ink/10 pt-1 text-right font-medium" data-testid="working-result">{working.result}</dd>
          </dl>
          {working.assumed && working.assumed.length > 0 && (
            <div className="mt-3 rounded border border-warn/30 bg-warn/5 px-2 py-1.5 text-xs text-ink-soft" data-testid="working-assumed">
              <p className="font-medium text-warn">Rests on typical values (nothing given in the drawing):</p>
              <ul className="mt-1 list-disc pl-4">{working.assumed.map((a) => <li key={a}>{a}</li>)}</ul>
            </div>
          )}
          <p className="mt-3 text-xs text-ink-faint">Source: {working.source}</p>
          <div className="mt-4 flex justify-end"><Button variant="secondary" onClick={onClose}>Close</Button></div>
        </>
      )}
    </Modal>
  );
}
