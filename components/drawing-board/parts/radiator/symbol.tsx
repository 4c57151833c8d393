import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Panel radiator: a finned panel, flow in at the top, return out at the bottom opposite end. */
export function RadiatorSymbol({ w, h }: SymbolProps) {
  const top = 14;
  const bottom = h - 14;
  const fins = Array.from({ length: 7 }, (_, i) => 14 + i * ((w - 28) / 6));
  return (
    <>
      <Line x1={w * 0.25} y1={0} x2={w * 0.25} y2={top} />
      <Line x1={w * 0.75} y1={bottom} x2={w * 0.75} y2={h} />
      <rect x={6} y={top} width={w - 12} height={bottom - top} rx={2} {...body} />
      {fins.map((x) => (
        <Line key={x} x1={x} y1={top + 4} x2={x} y2={bottom - 4} {...thin} />
      ))}
    </>
  );
}
