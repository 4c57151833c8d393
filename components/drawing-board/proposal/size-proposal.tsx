"use client";

import { ProposalForm } from "./proposal-form";
import { ProposalResult } from "./proposal-result";

/** The whole-network size proposal: options, then the answer. Used in the board's panel and in the sizing report. */
export function SizeProposal() {
  return (
    <div className="space-y-3" data-testid="size-proposal">
      <ProposalForm />
      <ProposalResult />
    </div>
  );
}
