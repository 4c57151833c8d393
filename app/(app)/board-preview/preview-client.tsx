"use client";
import { DrawingBoard, type BoardApi } from "@/components/drawing-board";
import type { Schematic } from "@/lib/schematic";

declare global {
  interface Window {
    __lwBoard?: BoardApi;
  }
}

// window.__lwBoard lets browser tests read the document and drive the view.
const expose = (api: BoardApi) => {
  window.__lwBoard = api;
};

export function BoardPreview({ doc, readOnly, height }: { doc: Schematic; readOnly: boolean; height?: string }) {
  return <DrawingBoard initialDoc={doc} readOnly={readOnly} onReady={expose} height={height}
    toolbarSlot={<span className="text-xs text-ink-faint" data-testid="toolbar-slot">preview — not saved</span>} />;
}
