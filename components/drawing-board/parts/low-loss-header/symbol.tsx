import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Low-loss header: a wide vertical tube joining primary (left) and secondary (right). */
export function LowLossHeaderSymbol({ w, h }: SymbolProps) {
  const x0 = w / 2 - 10;
  const x1 = w / 2 + 10;
  return (
    <>
      <rect x={x0} y={6} width={20} height={h - 12} rx={4} {...body} />
      {[0.25, 0.75].map((at) => (
        <g key={at}>
          <Line x1={0} y1={at * h} x2={x0} y2={at * h} />
          <Line x1={x1} y1={at * h} x2={w} y2={at * h} />
        </g>
      ))}
      <path d={`M${w / 2} ${h * 0.35} V${h * 0.65} M${w / 2 - 4} ${h * 0.6} L${w / 2} ${h * 0.65} L${w / 2 + 4} ${h * 0.6}`} {...thin} />
    </>
  );
}
