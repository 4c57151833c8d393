import { body, Leads, Line, thin, type SymbolProps } from "../symbol-kit";

/** Magnetic filter / dirt separator: a canister hung under the run, a magnet rod down its middle, a drain at the foot. */
export function MagneticFilterSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h * 0.3;
  const top = cy - 8;
  const bottom = h - 8;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - 12} x1={cx + 12} />
      <rect x={cx - 12} y={top} width={24} height={bottom - top} rx={6} {...body} />
      <Line x1={cx} y1={top + 4} x2={cx} y2={bottom - 6} strokeWidth={3} />
      {[0.35, 0.6].map((at) => (
        <path key={at} d={`M${cx - 8} ${top + at * (bottom - top)} q4 -4 8 0 q4 4 8 0`} {...thin} />
      ))}
      <Line x1={cx} y1={bottom} x2={cx} y2={h} />
    </>
  );
}
