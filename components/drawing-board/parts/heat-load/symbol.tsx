import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Generic heat load: a box giving off heat (wavy lines), flow in at the top, return at the bottom. */
export function HeatLoadSymbol({ w, h }: SymbolProps) {
  const top = 12;
  const bottom = h - 12;
  const wave = (x: number) => `M${x} ${bottom - 6} q-4 -4 0 -8 q4 -4 0 -8 q-4 -4 0 -8`;
  return (
    <>
      <Line x1={w * 0.25} y1={0} x2={w * 0.25} y2={top} />
      <Line x1={w * 0.75} y1={bottom} x2={w * 0.75} y2={h} />
      <rect x={6} y={top} width={w - 12} height={bottom - top} rx={2} {...body} strokeDasharray="6 2" />
      {[30, 40, 50].map((x) => (
        <path key={x} d={wave(x)} {...thin} />
      ))}
    </>
  );
}
