"use client";

import { useBoard } from "../store";
import { VelocityLegend } from "./velocity-legend";

/** Over the canvas once sized: only the velocity legend, bottom left beside the zoom controls, folded to a line on request. */
export function CanvasOverlay() {
  const sized = useBoard((s) => s.results !== null);
  if (!sized) return null;
  return <div className="pointer-events-auto absolute bottom-3 left-14 z-10"><VelocityLegend /></div>;
}
