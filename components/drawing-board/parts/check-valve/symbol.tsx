import { body, Leads, Line, type SymbolProps } from "../symbol-kit";

/** Non-return valve: a triangle pointing with the permitted flow (a → b) against a seat bar. */
export function CheckValveSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - 10} x1={cx + 8} />
      <path d={`M${cx - 10} ${cy - 9} L${cx + 7} ${cy} L${cx - 10} ${cy + 9} Z`} {...body} />
      <Line x1={cx + 8} y1={cy - 10} x2={cx + 8} y2={cy + 10} strokeWidth={2} />
    </>
  );
}
