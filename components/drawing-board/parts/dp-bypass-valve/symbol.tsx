import { body, InlineValve, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Differential-pressure bypass: valve body, spring on the stem, diaphragm dome on top. */
export function DpBypassValveSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Line x1={cx} y1={cy} x2={cx} y2={cy - 8} />
      <polyline points={`${cx} ${cy - 8} ${cx - 5} ${cy - 10} ${cx + 5} ${cy - 13} ${cx - 5} ${cy - 16} ${cx + 5} ${cy - 19} ${cx} ${cy - 21}`} {...stroke} strokeWidth={1} />
      <path d={`M${cx - 11} ${cy - 21} A11 7 0 0 1 ${cx + 11} ${cy - 21} Z`} {...body} />
      <InlineValve w={w} h={h} />
    </>
  );
}
