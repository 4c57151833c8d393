/**
 * The metrics table of side by side: one row per metric with both values, the difference
 * (b − a) and, where one side is plainly better, which and why. "Better" is marked only
 * when it does not hang on a trade-off: a check met on one side and failed on the other,
 * or fewer faults. Everything else (flows, pump head, the bypass setting, vessel size,
 * lengths) is shown without a verdict. Pure and client-safe.
 */
import { severities, type Metrics } from "./metrics";

export type Quantity = "flow" | "pressure" | "volume" | "velocity" | "power" | "length" | "count";
export type Side = "a" | "b";

interface RowBase { key: string; label: string; better: Side | null; why: string | null }
export interface NumberRow extends RowBase { kind: "number"; quantity: Quantity; a: number | null; b: number | null; diff: number | null; note?: { a?: string; b?: string } }
export interface TextRow extends RowBase { kind: "text"; a: string | null; b: string | null; same: boolean }
export type MetricRow = NumberRow | TextRow;

/** Equal within round-off (the same document sized twice gives the same bits; this allows for sums in another order). */
export const sameNumber = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

/** b − a; 0 when equal within round-off; null when either is unknown. */
export const difference = (a: number | null, b: number | null) => (a === null || b === null ? null : sameNumber(a, b) ? 0 : b - a);

/** The side with the lower value, when both are known and differ. */
function lower(a: number | null, b: number | null): Side | null {
  if (a === null || b === null || sameNumber(a, b)) return null;
  return a < b ? "a" : "b";
}

/** The one side that passes a check the other fails. */
function onlyPasses(passA: boolean | null, passB: boolean | null): Side | null {
  if (passA === true && passB === false) return "a";
  if (passB === true && passA === false) return "b";
  return null;
}

const meets = (x: number | null, limit: number | null, atLeast: boolean) =>
  x === null || limit === null ? null : atLeast ? x >= limit - 1e-9 : x <= limit + 1e-9;

function num(key: string, label: string, quantity: Quantity, a: number | null, b: number | null, better: Side | null = null, why: string | null = null): NumberRow {
  return { kind: "number", key, label, quantity, a, b, diff: difference(a, b), better, why: better ? why : null };
}

function text(key: string, label: string, a: string | null, b: string | null, better: Side | null = null, why: string | null = null): TextRow {
  return { kind: "text", key, label, a, b, same: a === b, better, why: better ? why : null };
}

const yesNo = (v: boolean | null) => (v === null ? null : v ? "yes" : "no");

function plantRows(a: Metrics, b: Metrics): MetricRow[] {
  const pumpOk = onlyPasses(meets(a.pumpAvailableHeadKpa, a.pumpRequiredHeadKpa, true), meets(b.pumpAvailableHeadKpa, b.pumpRequiredHeadKpa, true));
  const volumeOk = onlyPasses(meets(a.systemVolumeL, a.minimumVolumeL, true), meets(b.systemVolumeL, b.minimumVolumeL, true));
  const buffer = onlyPasses(a.bufferRecommended === null ? null : !a.bufferRecommended, b.bufferRecommended === null ? null : !b.bufferRecommended);
  return [
    num("heatSourceFlowM3h", "Heat-source design flow", "flow", a.heatSourceFlowM3h, b.heatSourceFlowM3h),
    // no verdict on head alone: a design may need less head from each of more pumps (a buffer's second circuit)
    num("pumpRequiredHeadKpa", "Pump head required", "pressure", a.pumpRequiredHeadKpa, b.pumpRequiredHeadKpa),
    num("pumpAvailableHeadKpa", "Pump head available", "pressure", a.pumpAvailableHeadKpa, b.pumpAvailableHeadKpa,
      pumpOk, "Only this side's pump gives the head its index circuit needs at the design flow."),
    text("indexCircuit", "Index circuit", a.indexCircuit, b.indexCircuit),
    num("bypassOpeningKpa", "Bypass opening", "pressure", a.bypassOpeningKpa, b.bypassOpeningKpa),
    num("heatSourceFlowAllZonesClosedM3h", "Heat-source flow, all zones shut", "flow", a.heatSourceFlowAllZonesClosedM3h, b.heatSourceFlowAllZonesClosedM3h),
    num("systemVolumeL", "System volume", "volume", a.systemVolumeL, b.systemVolumeL,
      volumeOk, "Only this side holds the heat source's minimum water volume."),
    num("minimumVolumeL", "Minimum volume", "volume", a.minimumVolumeL, b.minimumVolumeL),
    text("bufferRecommended", "Buffer needed", yesNo(a.bufferRecommended), yesNo(b.bufferRecommended),
      buffer, "This side needs no buffer: its own volume meets the heat source's minimum."),
    num("vesselRequiredL", "Expansion vessel required", "volume", a.vesselRequiredL, b.vesselRequiredL),
  ];
}

function velocityRow(a: Metrics, b: Metrics): NumberRow {
  const over = (m: Metrics) => meets(m.maxVelocityMps, m.velocityLimitMps, false) === false;
  const better = over(a) || over(b) ? lower(a.maxVelocityMps, b.maxVelocityMps) : null;
  const row = num("maxVelocityMps", "Largest velocity", "velocity", a.maxVelocityMps, b.maxVelocityMps,
    better, "The other side goes above its design velocity limit; this one is lower (less noise and wear).");
  return { ...row, note: { a: a.maxVelocityPipe ? `in ${a.maxVelocityPipe}` : undefined, b: b.maxVelocityPipe ? `in ${b.maxVelocityPipe}` : undefined } };
}

function emitterRows(a: Metrics, b: Metrics): MetricRow[] {
  const short = num("emitterShortfalls", "Emitters short of their load", "count", a.emitterShortfalls.length, b.emitterShortfalls.length,
    lower(a.emitterShortfalls.length, b.emitterShortfalls.length), "Fewer emitters fall short of their room's heat load at design.");
  return [
    num("emitterOutputW", "Emitter output at design", "power", a.emitterOutputW, b.emitterOutputW),
    { ...short, note: { a: a.emitterShortfalls.join(", ") || undefined, b: b.emitterShortfalls.join(", ") || undefined } },
  ];
}

function lengthRows(a: Metrics, b: Metrics): MetricRow[] {
  const keys = new Set<string>();
  for (const m of [a, b]) for (const [mat, sizes] of Object.entries(m.pipeLengthM)) for (const size of Object.keys(sizes)) keys.add(`${mat}\u0000${size}`);
  const at = (m: Metrics, mat: string, size: string) => m.pipeLengthM[mat]?.[size] ?? 0;
  const total = (m: Metrics) => Object.values(m.pipeLengthM).flatMap((s) => Object.values(s)).reduce((x, y) => x + y, 0);
  const rows = [...keys].sort().map((k) => {
    const [mat, size] = k.split("\u0000") as [string, string];
    return num(`pipeLengthM.${mat}.${size}`, `Pipe ${mat} ${size}`, "length", at(a, mat, size), at(b, mat, size));
  });
  return [num("pipeLengthM", "Pipe length, total", "length", total(a), total(b)), ...rows];
}

function findingRows(a: Metrics, b: Metrics): MetricRow[] {
  const words = { error: "errors", warning: "warnings", info: "notes" } as const;
  const rows: MetricRow[] = severities.map((s) => {
    const better = s === "info" ? null : lower(a.findings[s].count, b.findings[s].count);
    return num(`findings.${s}`, `Findings: ${words[s]}`, "count", a.findings[s].count, b.findings[s].count,
      better, `Fewer ${words[s]} from the checks.`);
  });
  const codes = (m: Metrics) => new Set(severities.flatMap((s) => m.findings[s].codes));
  const ca = codes(a);
  const cb = codes(b);
  const onlyA = [...ca].filter((c) => !cb.has(c));
  const onlyB = [...cb].filter((c) => !ca.has(c));
  if (onlyA.length + onlyB.length > 0) rows.push(text("findings.codes", "Finding codes on one side only", onlyA.join(", ") || "—", onlyB.join(", ") || "—"));
  return rows;
}

/** Every row of the table, in reading order: plant, velocity, emitters, pipe, findings. */
export function metricRows(a: Metrics, b: Metrics): MetricRow[] {
  return [...plantRows(a, b), velocityRow(a, b), ...emitterRows(a, b), ...lengthRows(a, b), ...findingRows(a, b)];
}
