import { body, Line, stroke, thin, type SymbolProps } from "../symbol-kit";

/** Hot-water cylinder: domed store with the heating coil zig-zagging down from coil flow to coil return. */
export function CylinderSymbol({ w, h }: SymbolProps) {
  const x0 = 8;
  const x1 = w - 14;
  const yf = h * 0.35;
  const yr = h * 0.75;
  const legs = 6;
  const pts = [`${x1} ${yf}`];
  for (let i = 0; i < legs; i++) {
    const y = yf + ((yr - yf) * (i + 0.5)) / legs;
    pts.push(`${i % 2 === 0 ? x0 + 8 : x1 - 8} ${y.toFixed(1)}`);
  }
  pts.push(`${x1} ${yr}`);
  return (
    <>
      <path d={`M${x0} 26 Q${x0} 4 ${(x0 + x1) / 2} 4 Q${x1} 4 ${x1} 26 V${h - 6} H${x0} Z`} {...body} />
      <Line x1={x1} y1={yf} x2={w} y2={yf} />
      <Line x1={x1} y1={yr} x2={w} y2={yr} />
      <polyline points={pts.join(" ")} {...stroke} />
      <path d={`M${x0 + 8} 20 H${x1 - 8}`} {...thin} strokeDasharray="3 3" />
    </>
  );
}
