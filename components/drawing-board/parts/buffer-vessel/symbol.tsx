import { body, Line, thin, type SymbolProps } from "../symbol-kit";

/** Buffer vessel: an upright store with domed ends, primary ports left, secondary right. */
export function BufferVesselSymbol({ w, h }: SymbolProps) {
  const x0 = 14;
  const x1 = w - 14;
  return (
    <>
      <path d={`M${x0} 22 Q${x0} 6 ${w / 2} 6 Q${x1} 6 ${x1} 22 V${h - 22} Q${x1} ${h - 6} ${w / 2} ${h - 6} Q${x0} ${h - 6} ${x0} ${h - 22} Z`} {...body} />
      {[0.25, 0.75].map((at) => (
        <g key={at}>
          <Line x1={0} y1={at * h} x2={x0} y2={at * h} />
          <Line x1={x1} y1={at * h} x2={w} y2={at * h} />
        </g>
      ))}
      <path d={`M${x0 + 6} ${h / 2} H${x1 - 6}`} {...thin} strokeDasharray="4 3" />
    </>
  );
}
