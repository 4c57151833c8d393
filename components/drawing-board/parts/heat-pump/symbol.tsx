import { body, Coil, Fan, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Outdoor heat pump: casing, fan on the air side, water coil to flow/return on the right. */
export function HeatPumpSymbol({ w, h }: SymbolProps) {
  const yf = h * 0.3;
  const yr = h * 0.7;
  return (
    <>
      <rect x={4} y={4} width={w - 16} height={h - 8} rx={4} {...body} />
      <Fan cx={34} cy={h / 2} r={22} />
      <Line x1={62} y1={8} x2={62} y2={h - 8} strokeDasharray="3 3" strokeWidth={1} />
      <Line x1={w - 12} y1={yf} x2={w} y2={yf} />
      <Line x1={w - 12} y1={yr} x2={w} y2={yr} />
      <polyline points={`${w - 12} ${yf} 74 ${yf}`} {...stroke} />
      <Coil x0={74} y0={yf} x1={74} y1={yr} n={3} amp={5} />
      <polyline points={`74 ${yr} ${w - 12} ${yr}`} {...stroke} />
    </>
  );
}
