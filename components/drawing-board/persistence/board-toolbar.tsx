"use client";

import { UnitsPicker } from "@/components/units/units-picker";
import { CompareWithLink } from "@/components/compare/compare-with-link";
import { HandoverLink } from "@/components/handover/handover-link";
import { SizeItButton } from "../overlay/size-it-button";
import { ExportMenu } from "./export-menu";
import { SizeProposalButton } from "../proposal/size-proposal-button";
import { RevisionStatusBar } from "./revision-status-bar";

/** board-2's part of the board's top bar (DrawingBoard toolbarSlot). */
export function BoardToolbar() {
  return (
    <>
      <RevisionStatusBar />
      <UnitsPicker />
      <ExportMenu />
      <CompareWithLink />
      <HandoverLink />
      <SizeItButton />
      <SizeProposalButton />
    </>
  );
}
