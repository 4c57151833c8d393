import { InlineValve, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Balancing valve: bow-tie with a handwheel and the diagonal arrow of an adjustable setting. */
export function BalancingValveSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Line x1={cx} y1={cy} x2={cx} y2={cy - 17} />
      <Line x1={cx - 8} y1={cy - 17} x2={cx + 8} y2={cy - 17} strokeWidth={2} />
      <InlineValve w={w} h={h} />
      <Line x1={cx - 15} y1={cy + 14} x2={cx + 13} y2={cy - 12} strokeWidth={1} />
      <path d={`M${cx + 7} ${cy - 12} L${cx + 14} ${cy - 13} L${cx + 13} ${cy - 6}`} {...stroke} strokeWidth={1} />
    </>
  );
}
