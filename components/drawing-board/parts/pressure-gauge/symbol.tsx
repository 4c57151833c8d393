import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Pressure gauge: a dial with scale ticks and needle on a stem. */
export function PressureGaugeSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = 16;
  const r = 12;
  const ticks = [-135, -90, -45, 0, 45].map((deg) => {
    const a = ((deg - 90) * Math.PI) / 180;
    return `M${cx + (r - 3) * Math.cos(a)} ${cy + (r - 3) * Math.sin(a)} L${cx + r * Math.cos(a)} ${cy + r * Math.sin(a)}`;
  });
  return (
    <>
      <Line x1={cx} y1={h} x2={cx} y2={cy + r} />
      <circle cx={cx} cy={cy} r={r} {...body} />
      <path d={ticks.join(" ")} {...thin} />
      <Line x1={cx} y1={cy} x2={cx + 6} y2={cy - 6} strokeWidth={1.3} />
      <circle cx={cx} cy={cy} r={1.6} fill="currentColor" />
    </>
  );
}
