import { body, Leads, Line, thin, type SymbolProps } from "../symbol-kit";

/** Heat meter: a flow-sensor body with its vane wheel and the calculator tap above. */
export function HeatMeterSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - 15} x1={cx + 15} />
      <rect x={cx - 15} y={cy - 10} width={30} height={20} rx={2} {...body} />
      <circle cx={cx} cy={cy} r={6} {...thin} />
      <path d={`M${cx - 6} ${cy} H${cx + 6} M${cx} ${cy - 6} V${cy + 6}`} {...thin} />
      <Line x1={cx + 10} y1={cy - 10} x2={cx + 10} y2={2} strokeWidth={1} strokeDasharray="2 2" />
    </>
  );
}
