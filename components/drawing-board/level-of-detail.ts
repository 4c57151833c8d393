"use client";
/**
 * Level of detail. Below LOD_ZOOM a symbol is a few pixels wide and a pipe label
 * unreadable, so parts are drawn as plain boxes on one canvas (overview-layer.tsx)
 * and pipes without labels: an overview of 1,000 parts then pans and zooms at
 * frame rate. Above it symbols are whole — the demo hall fitted to a laptop
 * screen (~30 %) still shows them; they are meant to be read from 50 %.
 */
import { useStore } from "@xyflow/react";

export const LOD_ZOOM = 0.25;

/** True while the view is zoomed out past LOD_ZOOM (a boolean selector: re-renders only at the crossing). */
export const useFarView = () => useStore((s) => s.transform[2] < LOD_ZOOM);
