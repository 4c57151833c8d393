import { body, Fan, Line, stroke, type SymbolProps } from "../symbol-kit";

/** Fan coil: a casing with the water coil (left) and the fan blowing across it (right). */
export function FanCoilSymbol({ w, h }: SymbolProps) {
  const top = 12;
  const bottom = h - 12;
  return (
    <>
      <Line x1={w * 0.25} y1={0} x2={w * 0.25} y2={top} />
      <Line x1={w * 0.75} y1={bottom} x2={w * 0.75} y2={h} />
      <rect x={6} y={top} width={w - 12} height={bottom - top} rx={2} {...body} />
      <polyline points={`20 ${top} 20 ${top + 4} 12 ${top + 8} 28 ${top + 14} 12 ${top + 20} 28 ${top + 26} 20 ${top + 30} 20 ${bottom}`} {...stroke} strokeWidth={1.2} />
      <path d={`M20 ${bottom} H${w * 0.75}`} {...stroke} strokeWidth={1.2} />
      <Fan cx={52} cy={h / 2} r={13} />
    </>
  );
}
