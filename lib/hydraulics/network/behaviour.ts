/**
 * Head-loss laws h(q) of network links for the gradient method, in the
 * solver's units: q in m³/h, h in kPa (loss from → to; a pump's is negative).
 * Each evaluation writes h and its slope g = dh/dq into `out`.
 *
 * Stored struct-of-arrays (one typed array per parameter, a law code per
 * link) rather than one closure per link: a 20,000-pipe network then costs a
 * handful of arrays instead of tens of thousands of long-lived objects, and
 * the solver's call site stays monomorphic — EPANET keeps its link data the
 * same way. Laws that are not smooth (check valve, dp-bypass, closed valve)
 * use a steep linear branch — EPANET keeps a closed link in the matrix with a
 * very large resistance (Rossman, EPANET 2.2 manual §12.2).
 */
import { kvPressureDropPa } from "@/lib/hydraulics/losses";
import { RE_LAMINAR_MAX as laminarMax, RE_TURBULENT_MIN as turbulentMin, transitionAnchorIn } from "@/lib/hydraulics/friction/darcy";
import { PIPE_DROP_SLOTS, pipeDropInto as pipeDropIntoImport, pipePressureDrop } from "@/lib/hydraulics/pipes/pressure-drop";
import { haalandRoughTerm, haalandStartX } from "@/lib/hydraulics/friction/colebrook";
import { transitionExponent, turbulentExponent } from "./friction-exponent";
import { maxFlowM3h, pumpHeadKpa, pumpHeadKpaUnchecked, type PumpCurve } from "@/lib/hydraulics/pumps/curve";

// Used per link per solver iteration: bound once at load (friction/darcy.ts says why).
const RE_LAMINAR_MAX = laminarMax;
const RE_TURBULENT_MIN = turbulentMin;
const pipeDropInto = pipeDropIntoImport;

/**
 * Resistance of an open "loss-free" link, kPa per m³/h: 1e-4 kPa at 1 m³/h,
 * negligible. Also the floor of every slope g (kept out of h, so the laws stay exact).
 */
export const OPEN_R = 1e-4;
/** Resistance of a closed link, kPa per m³/h: leaks 1e-8 m³/h at 100 kPa — reported as 0. */
export const CLOSED_R = 1e10;
/** Flows below this are "no flow" when reporting, m³/h. */
export const NO_FLOW_M3H = 1e-5;

export const LAW = { zero: 0, closed: 1, kv: 2, pipe: 3, pump: 4, check: 5, bypass: 6 } as const;
export type Law = (typeof LAW)[keyof typeof LAW];

export interface PipeGeometry {
  innerDiameterM: number;
  roughnessM: number;
  lengthM: number;
  sumK: number;
}

interface PumpData {
  curve: PumpCurve;
  qMax: number;
  h0: number;
  hMax: number;
  delta: number;
  steep: number;
}

/** Kv coefficient c in Δp[kPa] = c·q², q in m³/h (IEC 60534-1 definition via losses/kv.ts); 0 for "no Kv". */
export const kvCoefficient = (kv: number | null, densityKgM3: number): number =>
  kv === null ? 0 : kvPressureDropPa(1, kv, densityKgM3) / 1000;

/** pipePressureDrop's argument check: finite and > 0 (≥ 0 where zero is allowed). */
function usable(x: number, zeroOk: boolean): boolean {
  return Number.isFinite(x) && (zeroOk ? x >= 0 : x > 0);
}

export class LinkTable {
  /** law used by the solver */
  readonly law: Uint8Array;
  /** the link's own law (a load's resistance even when design cuts it) */
  readonly own: Uint8Array;
  /** Kv coefficient (kv, check, pump-in-series, bypass Kvs), kPa/(m³/h)² */
  readonly c: Float64Array;
  readonly d: Float64Array;
  readonly eps: Float64Array;
  readonly len: Float64Array;
  readonly sumK: Float64Array;
  readonly opening: Float64Array;
  /**
   * Head a pump link adds at its design duty, kPa, in the direction from → to
   * (negative: to → from); the solver's law is h(q) − gain. Design only
   * (sizing/design.ts); the own law (evaluateOwn) never includes it.
   */
  readonly gain: Float64Array;
  private readonly dir: Int8Array;
  private readonly switches: Uint8Array;
  private readonly lastA: Float64Array;
  private readonly lastH: Float64Array;
  private readonly lastG: Float64Array;
  /** 1/√f at the last turbulent evaluation: Colebrook's warm start (0: none yet) */
  private readonly lastX: Float64Array;
  /** Colebrook's f at Re 4000 (transitionAnchorF) for each pipe, so the transition's interpolation never solves it (0: not usable) */
  private readonly anchorF: Float64Array;
  /** the same by ε/D: pipes of one catalogue size share it, so it is solved once per size */
  private readonly anchorByRelRough = new Map<number, number>();
  /** Haaland's rough term (ε/D/3.7)^1.11 of each pipe, by ε/D like the anchor: Colebrook's first start costs no power */
  private readonly roughTerm: Float64Array;
  private readonly roughTermByRelRough = new Map<number, number>();
  private readonly pumps = new Map<number, PumpData>();
  /** per-pipe constants, filled by setPipe: cross-section πD²/4 and relative roughness ε/D */
  private readonly area: Float64Array;
  private readonly relRough: Float64Array;
  /** 1 where the geometry fails pipePressureDrop's checks: evaluated the checked way, so it throws as before */
  private readonly badPipe: Uint8Array;
  private readonly drop = new Float64Array(PIPE_DROP_SLOTS);
  private readonly rho: number;
  private readonly nu: number;

  constructor(
    readonly count: number,
    densityKgM3: number,
    kinematicViscosityM2s: number,
  ) {
    this.law = new Uint8Array(count);
    this.own = new Uint8Array(count);
    this.c = new Float64Array(count);
    this.d = new Float64Array(count);
    this.eps = new Float64Array(count);
    this.len = new Float64Array(count);
    this.sumK = new Float64Array(count);
    this.opening = new Float64Array(count);
    this.gain = new Float64Array(count);
    this.dir = new Int8Array(count);
    this.switches = new Uint8Array(count);
    this.lastA = new Float64Array(count).fill(-1);
    this.lastH = new Float64Array(count);
    this.lastG = new Float64Array(count);
    this.lastX = new Float64Array(count);
    this.anchorF = new Float64Array(count);
    this.area = new Float64Array(count);
    this.relRough = new Float64Array(count);
    this.roughTerm = new Float64Array(count);
    this.badPipe = new Uint8Array(count);
    this.rho = densityKgM3;
    this.nu = kinematicViscosityM2s;
  }

  set(k: number, law: Law, own: Law = law): void {
    this.law[k] = law;
    this.own[k] = own;
  }
  setPipe(k: number, g: PipeGeometry, law: Law = LAW.pipe): void {
    this.d[k] = g.innerDiameterM;
    this.eps[k] = g.roughnessM;
    this.len[k] = g.lengthM;
    this.sumK[k] = g.sumK;
    this.area[k] = (Math.PI * g.innerDiameterM * g.innerDiameterM) / 4;
    this.relRough[k] = g.roughnessM / g.innerDiameterM;
    this.badPipe[k] =
      usable(g.innerDiameterM, false) && usable(g.lengthM, true) && usable(g.roughnessM, true) && usable(this.rho, false) &&
      usable(this.nu, false) && usable(g.sumK, true) && g.roughnessM < g.innerDiameterM
        ? 0
        : 1;
    if (!this.badPipe[k]) {
      const rel = this.relRough[k]!;
      this.anchorF[k] = transitionAnchorIn(this.anchorByRelRough, rel);
      let term = this.roughTermByRelRough.get(rel);
      if (term === undefined) this.roughTermByRelRough.set(rel, (term = haalandRoughTerm(rel)));
      this.roughTerm[k] = term;
    }
    this.set(k, law, LAW.pipe);
  }
  /** A pump on its curve (pumps/curve.ts, linear between points), with a Kv device in series (coefficient c). */
  setPump(k: number, curve: PumpCurve, c: number, law: Law = LAW.pump): void {
    const qMax = maxFlowM3h(curve);
    const h0 = pumpHeadKpa(curve, 0) ?? 0;
    this.pumps.set(k, {
      curve,
      qMax,
      h0,
      hMax: pumpHeadKpa(curve, qMax) ?? 0,
      delta: Math.max(qMax * 1e-4, 1e-9),
      steep: Math.max(h0 / Math.max(qMax, 1e-9), 1) * 10,
    });
    this.c[k] = c;
    this.set(k, law, LAW.pump);
  }

  /**
   * Where the gradient method starts a pump that runs on its curve: the middle
   * of the curve's flow range, m³/h (EPANET starts a pump at its design flow,
   * Rossman, EPANET 2.2 manual §12.2 — recalled from memory); 0 for any other link.
   */
  startFlow(k: number): number {
    return this.law[k] === LAW.pump ? this.pumps.get(k)!.qMax / 2 : 0;
  }

  evaluate(k: number, q: number, out: Float64Array): void {
    this.evaluateAs(this.law[k]!, k, q, out);
    out[0] = out[0]! - this.gain[k]!;
  }
  evaluateOwn(k: number, q: number, out: Float64Array): void {
    this.evaluateAs(this.own[k]!, k, q, out);
  }

  private evaluateAs(law: number, k: number, q: number, out: Float64Array): void {
    switch (law) {
      case LAW.zero:
        out[0] = OPEN_R * q;
        out[1] = OPEN_R;
        return;
      case LAW.closed:
        out[0] = CLOSED_R * q;
        out[1] = CLOSED_R;
        return;
      case LAW.check:
        if (q < 0) {
          out[0] = CLOSED_R * q;
          out[1] = CLOSED_R;
          return;
        }
        this.kv(k, q, out);
        return;
      case LAW.kv:
        this.kv(k, q, out);
        return;
      case LAW.pipe:
        // q handed over in out[0], not as an argument: pipe() is too large to be inlined into
        // the solver, and a double passed to a call that is not inlined is boxed (a heap number per link per iteration)
        out[0] = q;
        this.pipe(k, out);
        return;
      case LAW.pump:
        this.pump(k, q, out);
        return;
      case LAW.bypass:
        this.bypass(k, q, out);
        return;
    }
  }

  /** Kv device: Δp = c·q|q| (c = 100·ρ/1000/Kv² kPa per (m³/h)²). */
  private kv(k: number, q: number, out: Float64Array): void {
    const c = this.c[k]!;
    const a = Math.abs(q);
    out[0] = c * q * a;
    out[1] = 2 * c * a + OPEN_R;
  }

  /**
   * Darcy–Weisbach pipe with fittings (pipes/pressure-drop.ts). The slope is
   * exact, each part by its local exponent n = d ln h / d ln q: friction ∝ q
   * laminar (Hagen–Poiseuille), 2 + d ln f / d ln Re in the turbulent and
   * transition ranges (friction-exponent.ts); fittings ∝ q². An exact slope
   * keeps Newton quadratic (Todini & Pilati 1988 use the exact derivative).
   * The last evaluation is cached: on a tree, design flows repeat exactly.
   */
  private pipe(k: number, out: Float64Array): void {
    const q = out[0]!;
    // Below 1e-6 m³/h the flow is laminar in any catalogue pipe: h is linear there.
    const qTiny = 1e-6;
    const a = Math.max(Math.abs(q), qTiny);
    if (a !== this.lastA[k]) {
      // pipeDropInto is pipePressureDrop's arithmetic without its checks: the
      // geometry was validated once (sizing/context.ts); the flow is checked here.
      if (!Number.isFinite(a) || this.badPipe[k]) {
        // throws the RangeError naming the field, as every evaluation used to
        pipePressureDrop({
          flowM3s: a / 3600,
          innerDiameterM: this.d[k]!,
          roughnessM: this.eps[k]!,
          lengthM: this.len[k]!,
          sumK: this.sumK[k]!,
          densityKgM3: this.rho,
          kinematicViscosityM2s: this.nu,
        });
      }
      const r = this.drop;
      let start = this.lastX[k]!;
      if (start === 0) {
        // no earlier turbulent point: Colebrook's Haaland start made here from the pipe's kept
        // rough term (Re as pipeDropInto computes it), the same start colebrookUnchecked makes
        const re = (Math.abs(a / 3600 / this.area[k]!) * this.d[k]!) / this.nu;
        if (re >= RE_TURBULENT_MIN) start = haalandStartX(re, this.roughTerm[k]!);
      }
      pipeDropInto(a / 3600, this.d[k]!, this.area[k]!, this.len[k]!, this.relRough[k]!, this.rho, this.nu, this.sumK[k]!, r, start, this.anchorF[k]!);
      const re = r[2]!;
      if (re >= RE_TURBULENT_MIN) this.lastX[k] = 1 / Math.sqrt(r[3]!);
      if (!Number.isFinite(re)) throw new RangeError(`re must be ≥ 0 and finite, got ${re}`);
      const fr = r[0]! / 1000;
      const fit = r[1]! / 1000;
      const n = re < RE_LAMINAR_MAX ? 1 : re >= RE_TURBULENT_MIN ? turbulentExponent(re, this.relRough[k]!, this.lastX[k]!) : transitionExponent(re, r[3]!, this.anchorF[k]!);
      this.lastA[k] = a;
      this.lastH[k] = fr + fit;
      this.lastG[k] = (n * fr + 2 * fit) / a + OPEN_R;
    }
    const h = this.lastH[k]!;
    out[0] = Math.abs(q) < qTiny ? (h / qTiny) * q : Math.sign(q) * h;
    out[1] = this.lastG[k]!;
  }

  /**
   * Pump head from its curve (negative loss) plus a series Kv device. Off the
   * curve the head falls steeply past the last point and rises steeply for
   * reverse flow — only so the solver can come back; such a point is reported.
   */
  private pump(k: number, q: number, out: Float64Array): void {
    const p = this.pumps.get(k)!;
    let head: number;
    let slope: number;
    if (q < 0) {
      head = p.h0 - p.steep * q;
      slope = -p.steep;
    } else if (q > p.qMax) {
      head = p.hMax - p.steep * (q - p.qMax);
      slope = -p.steep;
    } else {
      // The curve was checked in setPump (maxFlowM3h, pumpHeadKpa); a NaN flow throws as before.
      if (!Number.isFinite(q)) pumpHeadKpa(p.curve, q);
      head = pumpHeadKpaUnchecked(p.curve, q) ?? 0;
      const lo = Math.max(0, q - p.delta);
      const hi = Math.min(p.qMax, q + p.delta);
      slope = hi > lo ? ((pumpHeadKpaUnchecked(p.curve, hi) ?? 0) - (pumpHeadKpaUnchecked(p.curve, lo) ?? 0)) / (hi - lo) : 0;
    }
    const c = this.c[k]!;
    const a = Math.abs(q);
    out[0] = -head + c * q * a;
    out[1] = Math.max(-slope, 0) + 2 * c * a + OPEN_R;
  }

  /**
   * Differential-pressure bypass valve: shut below its opening Δp, then
   * passing flow while Δp rises only by its Kvs loss:
   *   shut: h = CLOSED_R·q;   open: h = ±opening + c·q|q|, one way.
   * Handled like EPANET's valve status checks (Rossman, EPANET 2.2 manual
   * §12.2): a shut valve whose leak implies |Δp| > opening opens that way; an
   * open one whose flow reverses shuts; after 8 switches the status is frozen
   * so it cannot cycle. Symmetric, so the drawn direction does not matter.
   * The status lives in this table, which is built afresh for each solve.
   */
  private bypass(k: number, q: number, out: Float64Array): void {
    const opening = this.opening[k]!;
    let dir = this.dir[k]!;
    if (this.switches[k]! < 8) {
      if (dir === 0 && Math.abs(q) * CLOSED_R > opening) {
        dir = Math.sign(q);
        this.switches[k]!++;
      } else if (dir !== 0 && q * dir < 0) {
        dir = 0;
        this.switches[k]!++;
      }
      this.dir[k] = dir;
    }
    if (dir === 0) {
      out[0] = CLOSED_R * q;
      out[1] = CLOSED_R;
      return;
    }
    const c = this.c[k]!;
    const a = Math.abs(q);
    out[0] = dir * opening + c * q * a;
    out[1] = 2 * c * a + OPEN_R;
  }
}
