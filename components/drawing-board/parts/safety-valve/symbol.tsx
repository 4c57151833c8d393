import { body, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Safety valve: angle body (inlet from below, discharge to the side) with its loading spring. */
export function SafetyValveSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h - 26;
  return (
    <>
      <Line x1={cx} y1={h} x2={cx} y2={cy + 11} />
      <path d={`M${cx} ${cy} L${cx - 8} ${cy + 11} L${cx + 8} ${cy + 11} Z`} {...body} />
      <path d={`M${cx} ${cy} L${cx + 11} ${cy - 8} L${cx + 11} ${cy + 8} Z`} {...body} />
      <Line x1={cx + 11} y1={cy} x2={w} y2={cy} strokeDasharray="2 2" />
      <polyline points={`${cx} ${cy} ${cx} ${cy - 6} ${cx - 5} ${cy - 9} ${cx + 5} ${cy - 13} ${cx - 5} ${cy - 17} ${cx + 5} ${cy - 21} ${cx} ${cy - 24}`} {...stroke} strokeWidth={1.1} />
      <Line x1={cx - 6} y1={cy - 25} x2={cx + 6} y2={cy - 25} />
    </>
  );
}
