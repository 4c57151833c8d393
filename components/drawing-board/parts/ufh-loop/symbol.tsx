import { Line, stroke, thin, type SymbolProps } from "../symbol-kit";

/** Underfloor loop: a serpentine pipe laid within a floor area (dashed). */
export function UfhLoopSymbol({ w, h }: SymbolProps) {
  const top = 12;
  const bottom = h - 12;
  const xs = [20, 28, 36, 44, 52, 60];
  const d = xs.map((x, i) => `${i === 0 ? "M" : "L"}${x} ${i % 2 === 0 ? top + 4 : bottom - 4} L${x} ${i % 2 === 0 ? bottom - 4 : top + 4}`).join(" ");
  return (
    <>
      <rect x={6} y={top} width={w - 12} height={bottom - top} rx={1} {...thin} strokeDasharray="4 3" />
      <Line x1={20} y1={0} x2={20} y2={top + 4} />
      <path d={`${d} L60 ${bottom}`} {...stroke} />
      <Line x1={60} y1={bottom} x2={60} y2={h} />
    </>
  );
}
