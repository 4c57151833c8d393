/** Timing helpers for the benchmark: wall and CPU time of one call, medians. */

export const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

export interface Timed<T> {
  value: T;
  wallMs: number;
  cpuMs: number;
}

/** Wall and CPU (user + system of this process) time of fn. */
export function time<T>(fn: () => T): Timed<T> {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const value = fn();
  const wallMs = performance.now() - t0;
  const c = process.cpuUsage(c0);
  return { value, wallMs, cpuMs: (c.user + c.system) / 1000 };
}

export const pad = (s: string | number, n: number) => String(s).padStart(n);
export const passFail = (ok: boolean) => (ok ? "PASS" : "FAIL");
