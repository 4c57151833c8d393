import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Automatic air vent: a float chamber on the pipe, venting upwards. */
export function AirVentSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  return (
    <>
      <Line x1={cx} y1={h} x2={cx} y2={28} />
      <rect x={cx - 8} y={12} width={16} height={16} rx={3} {...body} />
      <circle cx={cx} cy={22} r={3.5} {...thin} />
      <Line x1={cx} y1={12} x2={cx} y2={4} strokeWidth={1.2} />
      <path d={`M${cx - 3.5} 6.5 L${cx} 3 L${cx + 3.5} 6.5`} {...thin} />
    </>
  );
}
