/**
 * Which reported numbers differ between two Results of the same document, e.g.
 * a revision sized by an older engine and sized again by this one. Compares
 * the figures a designer acts on (pipe flow, velocity and Δp per mode, pump
 * heads, bypass, vessel, volume, emitter output, reheat time) and the findings
 * raised. Pure and client-safe. Input is unknown JSON: an old engine's answer
 * may lack fields, which then count as "not computed".
 */
import type { Results } from "./results";

export interface ResultChange {
  /** What, e.g. "heating · pipe p1 velocity (m/s)". */
  what: string;
  before: string;
  after: string;
}

/** Differences below this share of the larger value are round-off, not a change (common practice). */
export const RELATIVE_TOLERANCE = 0.005;
const ABSOLUTE_TOLERANCE = 1e-6;

type Num = number | null | undefined;
const fmt = (v: Num) => (v === null || v === undefined ? "—" : Number(v.toPrecision(4)).toString());
function differs(a: Num, b: Num): boolean {
  if (a === null || a === undefined || b === null || b === undefined) return (a ?? null) !== (b ?? null);
  return Math.abs(a - b) > Math.max(ABSOLUTE_TOLERANCE, RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b)));
}

type Figures = Map<string, Num>;

function figuresOf(r: Partial<Results>): Figures {
  const f: Figures = new Map();
  for (const m of r.modes ?? []) {
    for (const p of m.pipes ?? []) {
      f.set(`${m.mode} · pipe ${p.id} flow (m³/h)`, p.flowM3h);
      f.set(`${m.mode} · pipe ${p.id} velocity (m/s)`, p.velocityMps);
      f.set(`${m.mode} · pipe ${p.id} Δp (kPa)`, p.pressureDropKpa);
    }
    for (const d of m.pumps ?? []) f.set(`${m.mode} · pump ${d.id} head needed (kPa)`, d.requiredHeadKpa);
  }
  if (r.bypass) {
    f.set(`bypass ${r.bypass.id} opening (kPa)`, r.bypass.recommendedOpeningKpa);
    f.set(`bypass ${r.bypass.id} heat-source flow, zones shut (m³/h)`, r.bypass.heatSourceFlowAllZonesClosedM3h);
  }
  if (r.expansionVessel) f.set("expansion vessel required (L)", r.expansionVessel.requiredVolumeL);
  if (r.volume) f.set("system volume (L)", r.volume.systemL);
  for (const e of r.emitters ?? []) f.set(`emitter ${e.id} output (W)`, e.outputAtDesignW);
  if (r.hotWater) f.set(`cylinder ${r.hotWater.id} reheat (min)`, r.hotWater.reheatMinutes);
  return f;
}

const findingKeys = (r: Partial<Results>) => new Set((r.findings ?? []).map((f) => `${f.severity} ${f.code} ${f.refs.join(",")}`));

export function resultsChanges(beforeJson: unknown, afterJson: unknown): ResultChange[] {
  const before = (beforeJson ?? {}) as Partial<Results>;
  const after = (afterJson ?? {}) as Partial<Results>;
  const out: ResultChange[] = [];
  const a = figuresOf(before);
  const b = figuresOf(after);
  for (const key of new Set([...a.keys(), ...b.keys()])) {
    if (differs(a.get(key), b.get(key))) out.push({ what: key, before: fmt(a.get(key)), after: fmt(b.get(key)) });
  }
  const fa = findingKeys(before);
  const fb = findingKeys(after);
  for (const k of fb) if (!fa.has(k)) out.push({ what: `finding ${k}`, before: "—", after: "raised" });
  for (const k of fa) if (!fb.has(k)) out.push({ what: `finding ${k}`, before: "raised", after: "—" });
  return out;
}
