/**
 * Geometry of a pump-curve chart (client-safe, pure): the curve as drawn on the part, the
 * duty point (design flow, head needed) and the system curve through it, all mapped into a
 * box of the given size. The PDF and the HTML print view draw the same numbers.
 * System curve: h = h_duty·(q/q_duty)², the square law of turbulent pipe friction
 * (Darcy–Weisbach, Δp = f·(L/D)·ρv²/2, with the friction factor held constant — common
 * practice for sketching a system curve) — for reading the chart, not a computed network curve.
 */
export interface Chart {
  w: number; h: number;
  xMax: number; yMax: number;
  xTicks: number[]; yTicks: number[];
  curve: [number, number][];
  system: [number, number][];
  duty: [number, number] | null;
  /** map data → box coordinates (y down) */
  x: (q: number) => number; y: (h: number) => number;
}

function niceStep(max: number, count: number): number {
  const raw = max / count;
  const p = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 2.5, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? raw;
}
const ticks = (max: number) => {
  const step = niceStep(max, 5);
  return Array.from({ length: Math.floor(max / step + 1e-9) + 1 }, (_, i) => Number((i * step).toFixed(6)));
};

export function pumpChart(curve: [number, number][], duty: { flowM3h: number; headKpa: number } | null, w: number, h: number): Chart {
  const qs = [...curve.map((p) => p[0]), duty?.flowM3h ?? 0];
  const hs = [...curve.map((p) => p[1]), duty?.headKpa ?? 0];
  const xStep = niceStep(Math.max(...qs) * 1.1 || 1, 5);
  const yStep = niceStep(Math.max(...hs) * 1.1 || 1, 5);
  const xMax = Math.ceil((Math.max(...qs) * 1.1 || 1) / xStep) * xStep;
  const yMax = Math.ceil((Math.max(...hs) * 1.1 || 1) / yStep) * yStep;
  const x = (q: number) => (q / xMax) * w;
  const y = (v: number) => h - (v / yMax) * h;
  const system: [number, number][] = [];
  if (duty && duty.flowM3h > 0) {
    for (let i = 0; i <= 24; i++) {
      const q = (xMax * i) / 24;
      const head = duty.headKpa * (q / duty.flowM3h) ** 2;
      if (head > yMax) break;
      system.push([q, head]);
    }
  }
  return { w, h, xMax, yMax, xTicks: ticks(xMax), yTicks: ticks(yMax), curve, system, duty: duty ? [duty.flowM3h, duty.headKpa] : null, x, y };
}
