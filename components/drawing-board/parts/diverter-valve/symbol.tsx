import { Actuator, body, FILL, Line, type SymbolProps } from "../symbol-kit";

/** Three-port diverter: three triangles meeting at the centre; the shut way is filled. */
export function DiverterValveSymbol({ w, h, props }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  const s = 11;
  const t = 8;
  const shut = props.position === "b" ? "a" : "b";
  return (
    <>
      <Actuator cx={cx} top={4} stemTo={cy} />
      <Line x1={0} y1={cy} x2={cx - s} y2={cy} />
      <Line x1={cx + s} y1={cy} x2={w} y2={cy} />
      <Line x1={cx} y1={cy + s} x2={cx} y2={h} />
      <path d={`M${cx} ${cy} L${cx - s} ${cy - t} L${cx - s} ${cy + t} Z`} {...body} />
      <path d={`M${cx} ${cy} L${cx + s} ${cy - t} L${cx + s} ${cy + t} Z`} {...body} fill={shut === "a" ? "currentColor" : FILL} />
      <path d={`M${cx} ${cy} L${cx - t} ${cy + s} L${cx + t} ${cy + s} Z`} {...body} fill={shut === "b" ? "currentColor" : FILL} />
    </>
  );
}
