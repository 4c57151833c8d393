"use client";

import { useState } from "react";
import { setFirmReviewRuleAction } from "./actions";

/** The firm's review rule on the Team page: a switch for the firm's owners, a sentence for everyone else. */
export function FirmRuleForm({ projectId, firmName, initial, mayChange }: { projectId: string; firmName: string; initial: boolean; mayChange: boolean }) {
  const [on, setOn] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const change = async (next: boolean) => {
    setBusy(true);
    const r = await setFirmReviewRuleAction({ projectId, noSelfApproval: next });
    setBusy(false);
    if (!r.ok) return setError(r.error);
    setError(null);
    setOn(r.data.noSelfApproval);
  };
  return (
    <div className="text-sm" data-testid="firm-review-rule">
      <label className="flex items-start gap-2">
        <input type="checkbox" className="mt-1" checked={on} disabled={!mayChange || busy} onChange={(e) => void change(e.target.checked)} />
        <span>
          <span className="font-medium">A reviewer may not approve a revision they authored</span>
          <span className="block text-ink-soft">
            {firmName}&apos;s rule for every project{mayChange ? "; only the firm's owners can change it." : `, set by ${firmName}'s owners.`} Checked on the server at each approval.
          </span>
        </span>
      </label>
      {error && <p role="alert" className="mt-1 text-fault">{error}</p>}
    </div>
  );
}
