/**
 * A small writer of schematic parts and pipes for the first-draft generator:
 * every part gets an explicit orientation (the board's `rotation`/`flipX`
 * layout fields) so ports face the way the layout needs, and every pipe its
 * length and fitting counts.
 */
import type { FittingCounts, PartType } from "@/lib/schematic";

/** Which way a part's ports face (rotation first flips, then turns clockwise: components/drawing-board/parts/orientation.ts). */
export const FACING = {
  /** two-port parts: a left, b right (flow runs left → right) */
  ltr: { rotation: 0, flipX: false },
  /** two-port parts: a right, b left (return runs right → left) */
  rtl: { rotation: 0, flipX: true },
  /** two-port parts: a top, b bottom */
  down: { rotation: 90, flipX: false },
  /** tee: a left, b right, c bottom */
  teeDown: { rotation: 0, flipX: false },
  /** tee: a left, b right, c top */
  teeUp: { rotation: 180, flipX: true },
  /** tee on a return run: a right, b left, c top */
  returnTeeUp: { rotation: 180, flipX: false },
  /** tee on a return main: a right, b left, c bottom */
  returnTeeDown: { rotation: 0, flipX: true },
  /** tee: a top, b bottom, c right (a run turning down to the main) */
  teeCorner: { rotation: 270, flipX: true },
  /** accessories whose port is drawn at the bottom, turned to face up */
  portUp: { rotation: 180, flipX: false },
  plain: { rotation: 0, flipX: false },
} as const;
export type Facing = (typeof FACING)[keyof typeof FACING];

export interface DraftPart {
  id: string;
  type: PartType;
  x: number;
  y: number;
  label: string;
  rotation: number;
  flipX: boolean;
  props: Record<string, unknown>;
}
export interface DraftPipe {
  id: string;
  from: string;
  to: string;
  material: "copper";
  size: string;
  lengthM: number;
  fittings: FittingCounts;
}

const fittings = (f: Partial<FittingCounts>): FittingCounts => ({ elbow: 0, bend: 0, teeRun: 0, teeBranch: 0, reducer: 0, ...f });

export class DraftBuilder {
  readonly parts: DraftPart[] = [];
  readonly pipes: DraftPipe[] = [];

  part(id: string, type: PartType, at: { x: number; y: number }, label: string, props: Record<string, unknown> = {}, facing: Facing = FACING.plain): string {
    this.parts.push({ id, type, x: at.x, y: at.y, label, rotation: facing.rotation, flipX: facing.flipX, props });
    return id;
  }

  /** A pipe from port to port (`part.port`), in the direction the water runs. Size "22" until the engine suggests one. */
  pipe(id: string, from: string, to: string, lengthM: number, f: Partial<FittingCounts> = {}, size = "22"): void {
    this.pipes.push({ id, from, to, material: "copper", size, lengthM: Math.round(lengthM * 100) / 100, fittings: fittings(f) });
  }

  find(id: string): DraftPart {
    const p = this.parts.find((q) => q.id === id);
    if (!p) throw new Error(`draft: no part ${id}`); // a generator bug, not input
    return p;
  }
}
