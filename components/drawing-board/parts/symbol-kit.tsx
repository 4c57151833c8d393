/**
 * Drawing primitives shared by the part symbols: one line style (stroke in
 * currentColor, 1.5 px, round joins), paper fill for bodies, and the few
 * shapes engineering diagrams reuse (lead lines, the valve bow-tie, an
 * actuator box). Symbols draw in their own w×h box, unoriented; the node
 * turns/mirrors them, so symbols never contain text.
 */
import type { SVGProps } from "react";

export interface SymbolProps {
  w: number;
  h: number;
  props: Record<string, unknown>;
}

export const FILL = "var(--lw-symbol-fill, #fffdf9)";
export const stroke = { stroke: "currentColor", strokeWidth: 1.5, strokeLinecap: "round", strokeLinejoin: "round", fill: "none" } as const;
export const body = { ...stroke, fill: FILL } as const;
export const thin = { ...stroke, strokeWidth: 1 } as const;

export function Line({ x1, y1, x2, y2, ...rest }: SVGProps<SVGLineElement>) {
  return <line x1={x1} y1={y1} x2={x2} y2={y2} {...stroke} {...rest} />;
}

/** Horizontal lead lines from both sides to a body spanning x0..x1 at height y. */
export function Leads({ w, y, x0, x1 }: { w: number; y: number; x0: number; x1: number }) {
  return (
    <>
      <Line x1={0} y1={y} x2={x0} y2={y} />
      <Line x1={x1} y1={y} x2={w} y2={y} />
    </>
  );
}

/** Two triangles tip to tip: the general valve body. Filled when closed. */
export function BowTie({ cx, cy, s = 11, t = 8, closed = false }: { cx: number; cy: number; s?: number; t?: number; closed?: boolean }) {
  const d = `M${cx - s} ${cy - t} L${cx + s} ${cy + t} L${cx + s} ${cy - t} L${cx - s} ${cy + t} Z`;
  return <path d={d} {...body} fill={closed ? "currentColor" : FILL} />;
}

/** Valve bow-tie on a through line, the body centred in the box. */
export function InlineValve({ w, h, closed }: { w: number; h: number; closed?: boolean }) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - 11} x1={cx + 11} />
      <BowTie cx={cx} cy={cy} closed={closed} />
    </>
  );
}

/** Stem from the valve centre up to an actuator box (motorised valves). */
export function Actuator({ cx, top, stemTo }: { cx: number; top: number; stemTo: number }) {
  return (
    <>
      <Line x1={cx} y1={stemTo} x2={cx} y2={top + 12} />
      <rect x={cx - 9} y={top} width={18} height={12} rx={1.5} {...body} />
      <path d={`M${cx - 5} ${top + 8} L${cx - 2} ${top + 4} L${cx + 2} ${top + 8} L${cx + 5} ${top + 4}`} {...thin} />
    </>
  );
}

/** Three fan blades around a hub: heat pumps and fan coils. */
export function Fan({ cx, cy, r }: { cx: number; cy: number; r: number }) {
  const blades = [0, 120, 240].map((deg) => {
    const a = (deg * Math.PI) / 180;
    const b = a + 0.9;
    const p = (ang: number, rr: number) => `${(cx + rr * Math.cos(ang)).toFixed(2)} ${(cy + rr * Math.sin(ang)).toFixed(2)}`;
    return `M${p(a, r * 0.22)} Q${p(a + 0.2, r * 0.95)} ${p(b, r * 0.85)} Q${p(b - 0.25, r * 0.45)} ${p(a + 0.45, r * 0.22)}`;
  });
  return (
    <>
      <circle cx={cx} cy={cy} r={r} {...body} />
      {blades.map((d) => (
        <path key={d} d={d} {...thin} />
      ))}
      <circle cx={cx} cy={cy} r={r * 0.16} {...thin} fill="currentColor" />
    </>
  );
}

/** A zig-zag heat-exchanger coil between two points, n legs wide. */
export function Coil({ x0, y0, x1, y1, n = 4, amp = 8 }: { x0: number; y0: number; x1: number; y1: number; n?: number; amp?: number }) {
  const pts: string[] = [`${x0} ${y0}`];
  for (let i = 1; i < n * 2; i++) {
    const t = i / (n * 2);
    const side = i % 2 === 0 ? 0 : i % 4 === 1 ? 1 : -1;
    pts.push(`${x0 + (x1 - x0) * t + (y1 !== y0 ? side * amp : 0)} ${y0 + (y1 - y0) * t + (y1 === y0 ? side * amp : 0)}`);
  }
  pts.push(`${x1} ${y1}`);
  return <polyline points={pts.join(" ")} {...stroke} />;
}
