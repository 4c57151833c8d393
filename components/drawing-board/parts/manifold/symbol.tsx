import { body, Line, type SymbolProps } from "../symbol-kit";
import { layoutOf } from "../layout";

/** Manifold: a header bar fed from the left, one outlet stub per loop along the bottom. */
export function ManifoldSymbol({ w, h, props }: SymbolProps) {
  const { ports } = layoutOf("manifold", props);
  const outlets = Object.entries(ports).filter(([name]) => name !== "common");
  return (
    <>
      <Line x1={0} y1={h / 2} x2={8} y2={h / 2} />
      <rect x={8} y={h / 2 - 7} width={w - 14} height={14} rx={3} {...body} />
      {outlets.map(([name, spot]) => (
        <g key={name}>
          <Line x1={spot.at * w} y1={h / 2 + 7} x2={spot.at * w} y2={h} />
          <circle cx={spot.at * w} cy={h / 2 + 12} r={2.2} fill="currentColor" />
        </g>
      ))}
    </>
  );
}
