import { BowTie, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Drain cock at a low point: a small valve below the pipe with its hose spout. */
export function DrainCockSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  return (
    <>
      <Line x1={cx} y1={0} x2={cx} y2={10} />
      <g transform={`rotate(90 ${cx} 18)`}>
        <BowTie cx={cx} cy={18} s={8} t={6} />
      </g>
      <path d={`M${cx} 26 V31 L${cx + 8} 36`} {...stroke} />
      <Line x1={cx + 5} y1={38} x2={cx + 10} y2={33} />
    </>
  );
}
