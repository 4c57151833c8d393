import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Expansion vessel: a capsule split by its diaphragm, gas side above (with the charge valve), water below. */
export function ExpansionVesselSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const x0 = cx - 20;
  const bottom = h - 14;
  const mid = (6 + bottom) / 2;
  return (
    <>
      <rect x={x0} y={8} width={40} height={bottom - 8} rx={18} {...body} />
      <path d={`M${x0} ${mid} Q${cx} ${mid + 12} ${x0 + 40} ${mid}`} {...thin} strokeWidth={1.3} />
      <Line x1={cx} y1={2} x2={cx} y2={8} strokeWidth={1.2} />
      <Line x1={cx - 3} y1={2} x2={cx + 3} y2={2} strokeWidth={1.2} />
      <Line x1={cx} y1={bottom} x2={cx} y2={h} />
      {[-10, 0, 10].map((dx) => (
        <path key={dx} d={`M${cx + dx - 4} ${mid - 6} L${cx + dx + 4} ${mid - 14}`} {...thin} />
      ))}
    </>
  );
}
