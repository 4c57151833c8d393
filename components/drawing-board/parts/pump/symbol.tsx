import { body, Leads, stroke, type SymbolProps } from "../symbol-kit";

/** Circulator: a circle with a triangle whose tip touches the outlet side. */
export function PumpSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  const cy = h / 2;
  const r = 17;
  return (
    <>
      <Leads w={w} y={cy} x0={cx - r} x1={cx + r} />
      <circle cx={cx} cy={cy} r={r} {...body} />
      <path d={`M${cx - 8.5} ${cy - 14.7} L${cx + r} ${cy} L${cx - 8.5} ${cy + 14.7}`} {...stroke} />
    </>
  );
}
