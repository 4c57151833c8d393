import { Line, type SymbolProps } from "../symbol-kit";

/** Tee: run a–b with the branch c, and the junction dot of a soldered joint. */
export function TeeSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  return (
    <>
      <Line x1={0} y1={cy} x2={w} y2={cy} />
      <Line x1={cx} y1={cy} x2={cx} y2={h} />
      <circle cx={cx} cy={cy} r={3.2} fill="currentColor" />
    </>
  );
}
