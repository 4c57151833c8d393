import { body, Leads, Line, type SymbolProps } from "../symbol-kit";

/** Y-strainer: a run with the screen pocket angled down and back. */
export function StrainerSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - 14} x1={cx + 14} />
      <path d={`M${cx - 14} ${cy - 6} H${cx + 14} V${cy + 6} H${cx + 6} L${cx + 14} ${cy + 20} L${cx + 4} ${cy + 25} L${cx - 6} ${cy + 6} H${cx - 14} Z`} {...body} />
      <Line x1={cx - 2} y1={cy + 4} x2={cx + 8} y2={cy + 21} strokeDasharray="2 2.5" strokeWidth={1} />
    </>
  );
}
