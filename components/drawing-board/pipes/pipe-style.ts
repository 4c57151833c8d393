/**
 * How a pipe is drawn, shared by the canvas (pipe-edge.tsx) and the drawings made
 * outside it (export, side by side, the handover report on the server): flow/return
 * colours, the "size · length" caption and how a run turns. No React, no "use client".
 */
import type { Pipe } from "@/lib/schematic";
import type { PipeSide } from "./flow-side";

export const sideColour: Record<PipeSide, string> = { flow: "#c8322b", return: "#2b5fc8", none: "#8a8378" };

const metres = (m: number) => `${Number.isInteger(m) ? m : Number(m.toFixed(2))} m`;
export const pipeCaption = (pipe: Pipe) => `${pipe.size} · ${metres(pipe.lengthM)}`;
/** How a run turns between its ports (getSmoothStepPath), shared with the overview canvas. */
export const PIPE_STEP = { borderRadius: 6, offset: 16 } as const;
