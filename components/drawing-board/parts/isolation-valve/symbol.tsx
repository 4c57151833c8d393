import { InlineValve, Line, type SymbolProps } from "../symbol-kit";

/** Isolation (ball) valve: bow-tie with a ball and a lever; filled when set closed. */
export function IsolationValveSymbol({ w, h, props }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  const closed = props.open === false;
  return (
    <>
      <InlineValve w={w} h={h} closed={closed} />
      <circle cx={cx} cy={cy} r={3} fill="currentColor" />
      <Line x1={cx} y1={cy} x2={cx} y2={cy - 14} />
      {closed ? <Line x1={cx} y1={cy - 14} x2={cx} y2={cy - 19} /> : <Line x1={cx} y1={cy - 14} x2={cx + 12} y2={cy - 14} />}
    </>
  );
}
