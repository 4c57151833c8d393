import { body, BowTie, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Filling loop: isolating valve, flexible hose loop, non-return valve, to the cold main. */
export function FillingLoopSymbol({ w, h }: SymbolProps) {
  const cy = h / 2;
  return (
    <>
      <Line x1={0} y1={cy} x2={8} y2={cy} />
      <BowTie cx={16} cy={cy} s={7} t={5} />
      <path d={`M23 ${cy} C30 ${cy - 16} 46 ${cy - 16} 46 ${cy} C46 ${cy + 12} 34 ${cy + 12} 36 ${cy + 2} C38 ${cy - 6} 48 ${cy - 4} 52 ${cy}`} {...stroke} strokeWidth={1.2} />
      <path d={`M52 ${cy - 6} L62 ${cy} L52 ${cy + 6} Z`} {...body} />
      <Line x1={63} y1={cy - 7} x2={63} y2={cy + 7} strokeWidth={2} />
      <Line x1={63} y1={cy} x2={w} y2={cy} strokeDasharray="2 2" />
    </>
  );
}
