import { body, Line, stroke, thin, type SymbolProps } from "../symbol-kit";

/** Boiler: casing with a flame over a burner bar; flow and return leave on the right. */
export function BoilerSymbol({ w, h }: SymbolProps) {
  const yf = h * 0.3;
  const yr = h * 0.7;
  return (
    <>
      <rect x={6} y={4} width={w - 18} height={h - 8} rx={3} {...body} />
      <path d="M34 72 C22 64 24 50 31 40 C31 48 35 50 37 52 C37 42 41 34 47 28 C46 40 54 46 52 60 C51 67 46 72 40 72 Z" {...stroke} />
      <Line x1={18} y1={78} x2={58} y2={78} strokeWidth={2} />
      <path d="M22 84 L26 80 M32 84 L36 80 M42 84 L46 80 M52 84 L56 80" {...thin} />
      <Line x1={w - 12} y1={yf} x2={w} y2={yf} />
      <Line x1={w - 12} y1={yr} x2={w} y2={yr} />
    </>
  );
}
