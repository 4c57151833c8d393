import { body, Line, type SymbolProps } from "../symbol-kit";

/** Temperature sensor in a pocket: a thermometer stem and bulb above the pipe. */
export function TemperatureSensorSymbol({ w, h }: SymbolProps) {
  const cx = w / 2;
  return (
    <>
      <Line x1={cx} y1={h} x2={cx} y2={32} />
      <path d={`M${cx - 3.5} 23 V7 A3.5 3.5 0 0 1 ${cx + 3.5} 7 V23 A6 6 0 1 1 ${cx - 3.5} 23 Z`} {...body} />
      <circle cx={cx} cy={27} r={3.2} fill="currentColor" />
      <Line x1={cx} y1={24} x2={cx} y2={11} strokeWidth={1.6} />
    </>
  );
}
