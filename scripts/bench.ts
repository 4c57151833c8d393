/**
 * npm run bench — (a) the sizing engine on generated buildings of ~500 … 20,000
 * pipes: median wall time of several runs after a warm-up (three runs up to
 * 2,000 pipes), median CPU time of the same runs (process.cpuUsage, user +
 * system; on a shared, busy machine wall time includes waiting, CPU time does
 * not), heap still held by one answer (measured on a separate untimed run),
 * and the log-log growth exponent beside that of
 * n·log n; (b) the HTTP API, when a server answers at BENCH_URL: autocannon,
 * 10 connections for 10 s, POSTing the Millbrook Hall demo schematic to
 * /api/v1/calculate; (c) the drawing board in chromium against the same server
 * (scripts/bench-board.ts): the demo hall's open time and frame times of pan and
 * zoom with 1,000 parts — printed beside their targets, not asserted.
 *
 * (c) the first-draft generator (scripts/bench-draft.ts).
 *
 * Targets: 2,000 pipes < 100 ms, 20,000 pipes < 1 s; API ≥ 200 req/s, p99 < 50 ms.
 * Then (scripts/bench/): one scenario solve beside EPANET 2.2 open + solve on the same
 * buildings and looped grids of 1,000 and 10,000 pipes (≤ 0.5 ×), with fill and work of the
 * solver's order against nested dissection; calculate() of 2,000 pipes against JSON.parse +
 * JSON.stringify (< 3 ×); optimising the demo hall (< 1 s); the demo hall's handover report
 * as PDF and HTML (< 2 s, scripts/bench/handover-report.ts).
 * Env: BENCH_URL (default http://localhost:3000), BENCH_COOKIE (sent as Cookie),
 * BENCH_SIZES (e.g. "500,2000"), BENCH_SECONDS (API duration, default 10),
 * BENCH_GC_EACH=1 (force a full gc() before every timed run, the old timing),
 * BENCH_EPANET_SIZES (default "1000,10000"), BENCH_ONLY (sections, e.g. "solver,calc").
 * npm run bench runs this file bundled by esbuild into .run/bench/ (our code in one ES module,
 * packages imported as installed), as the app's production build runs the engine; under tsx each
 * use of an imported name is a getter call and the engine took 1.4–2.5× its bundled CPU time.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { availableParallelism, loadavg } from "node:os";
import { setFlagsFromString } from "node:v8";
import { runInNewContext } from "node:vm";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
import { benchBoard } from "./bench-board";
import { benchDraft } from "./bench-draft";
import { benchCalcVsJson, benchOptimiseHall } from "./bench/calc-vs-json";
import { benchSolverVsEpanet } from "./bench/solver-vs-epanet";
import { benchHandoverReport } from "./bench/handover-report";

// A real gc() makes the heap figures comparable between sizes (no --expose-gc flag needed).
setFlagsFromString("--expose-gc");
const gc = runInNewContext("gc") as () => void;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};
/** Least-squares slope of log y against log x. */
function logLogSlope(xs: number[], ys: number[]): number {
  const lx = xs.map(Math.log), ly = ys.map(Math.log);
  const mx = lx.reduce((a, b) => a + b, 0) / lx.length, my = ly.reduce((a, b) => a + b, 0) / ly.length;
  let num = 0, den = 0;
  lx.forEach((x, i) => {
    num += (x - mx) * (ly[i]! - my);
    den += (x - mx) ** 2;
  });
  return num / den;
}
const pad = (s: string | number, n: number) => String(s).padStart(n);
const passFail = (ok: boolean) => (ok ? "PASS" : "FAIL");

function benchEngine() {
  const sizes = (process.env.BENCH_SIZES ?? "500,2000,5000,20000").split(",").map(Number).filter((n) => n > 0);
  const targetsMs: Record<number, number> = { 2000: 100, 20000: 1000 };
  const [load1] = loadavg();
  const cores = availableParallelism();
  console.log("Engine: calculate() on generated buildings (median of runs after warm-up)");
  console.log(`load average ${load1!.toFixed(1)} on ${cores} cores${load1! > cores ? " — machine busy: wall times include waiting, CPU ms is the engine's own work" : ""}\n`);
  console.log(`${pad("pipes", 7)} ${pad("parts", 7)} ${pad("runs", 5)} ${pad("median ms", 10)} ${pad("min ms", 8)} ${pad("cpu ms", 8)} ${pad("heap Δ MB", 10)}  ok  wall vs target   cpu`);
  const ns: number[] = [], ms: number[] = [], cpuMs: number[] = [];
  let allPass = true;
  for (const n of sizes) {
    const doc = generateBuildingWithPipes(n);
    const runs = n <= 2_000 ? 9 : n <= 5_000 ? 5 : 3;
    const first = calculate(doc); // warm-up (JIT), also the correctness probe
    // Small sizes finish before the JIT has optimised the engine: warm up a little more.
    for (let w = n <= 2_000 ? 2 : 0; w > 0; w--) calculate(doc);
    const times: number[] = [], cpu: number[] = [];
    let heapDelta = 0;
    // Timed runs back to back, as a server sees them. A forced full gc() right
    // before a timed run makes V8 shrink its young generation, and the run then
    // pays 2–3× the CPU in scavenges (helper threads: CPU > wall) — a cost no
    // server sees. BENCH_GC_EACH=1 restores the old gc()-before-every-run timing.
    const gcEach = process.env.BENCH_GC_EACH === "1";
    gc();
    for (let r = 0; r < runs; r++) {
      if (gcEach) gc();
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      const out = calculate(doc);
      times.push(performance.now() - t0);
      const c = process.cpuUsage(c0);
      cpu.push((c.user + c.system) / 1000);
      if (!out.ok) break;
    }
    // heap still held while the result is alive: what one answer of this size costs to keep (own untimed run)
    for (let r = 0; r < 2; r++) {
      gc();
      const before = process.memoryUsage().heapUsed;
      const held = calculate(doc);
      gc();
      if (held.ok) heapDelta = Math.max(heapDelta, process.memoryUsage().heapUsed - before);
    }
    const med = median(times);
    const cpuMed = median(cpu);
    ns.push(doc.pipes.length);
    ms.push(med);
    cpuMs.push(cpuMed);
    const target = targetsMs[n];
    const verdict = target === undefined ? "" : `${passFail(med < target)}  < ${String(target).padEnd(4)} ms  ${passFail(cpuMed < target)}`;
    if (target !== undefined && !(med < target)) allPass = false;
    console.log(
      `${pad(doc.pipes.length, 7)} ${pad(doc.parts.length, 7)} ${pad(times.length, 5)} ${pad(med.toFixed(1), 10)} ${pad(Math.min(...times).toFixed(1), 8)} ${pad(cpuMed.toFixed(1), 8)} ${pad((heapDelta / 2 ** 20).toFixed(1), 10)}  ${first.ok ? "yes" : "NO "} ${verdict}`,
    );
    if (!first.ok) console.log(`        engine refused the document: ${JSON.stringify(first.issues).slice(0, 300)}`);
  }
  if (ns.length >= 2) {
    const kRef = logLogSlope(ns, ns.map((n) => n * Math.log(n)));
    console.log(
      `\nGrowth exponent (log-log slope vs pipes): wall ${logLogSlope(ns, ms).toFixed(2)}, cpu ${logLogSlope(ns, cpuMs).toFixed(2)}` +
        `  — n·log n over the same sizes: ${kRef.toFixed(2)}, n: 1.00, n²: 2.00`,
    );
  }
  return allPass;
}

/** One POST: the HTTP status, or why nothing usable answered (refused, unknown host, too slow). */
async function probe(url: string, headers: Record<string, string>, body: string): Promise<{ status: number } | { why: string }> {
  try {
    // generous: a development server compiles the route on its first request
    const res = await fetch(url, { method: "POST", headers, body, signal: AbortSignal.timeout(60_000) });
    await res.arrayBuffer();
    return { status: res.status };
  } catch (e) {
    const code = (e as { cause?: { code?: string } }).cause?.code;
    if ((e as Error).name === "TimeoutError") return { why: "no answer within 60 s" };
    return { why: code === "ECONNREFUSED" ? "nothing listens there" : `request failed (${code ?? (e as Error).message})` };
  }
}

interface CannonResult {
  requests: { average: number };
  latency: { p99: number; average: number };
  non2xx: number;
  errors: number;
  timeouts: number;
}
type Autocannon = (opts: Record<string, unknown>) => Promise<CannonResult>;

async function benchApi() {
  const base = (process.env.BENCH_URL ?? "http://localhost:3000").replace(/\/$/, "");
  const url = `${base}/api/v1/calculate`;
  console.log(`\nAPI: POST ${url}`);
  const body = readFileSync(path.resolve("db/seeds/data/millbrook-hall.json"), "utf8");
  // a request with a session cookie must say it comes from the app itself (lib/http/request-guard.ts)
  const headers: Record<string, string> = { "content-type": "application/json", origin: new URL(base).origin };
  if (process.env.BENCH_COOKIE) headers.cookie = process.env.BENCH_COOKIE;
  const first = await probe(url, headers, body);
  if ("why" in first || first.status === 401 || first.status === 403) {
    const why = "why" in first ? first.why : `HTTP ${first.status}: set BENCH_COOKIE to a signed-in session cookie`;
    console.log(`  skipped: ${why}.`);
    console.log("  Run it against a production server: `npm run build && npm run serve` (or `npm run start`) in one shell,");
    console.log("  then `BENCH_URL=http://localhost:3000 BENCH_COOKIE='<session cookie>' npm run bench`.");
    return "skipped" as const;
  }
  if (first.status < 200 || first.status >= 300) {
    console.log(`  probe answered HTTP ${first.status}: check the route — skipped.`);
    return "fail" as const;
  }
  const requireCjs = createRequire(path.resolve("package.json"));
  const autocannon = requireCjs("autocannon") as Autocannon;
  const duration = Number(process.env.BENCH_SECONDS ?? 10);
  // Warm-up, not counted: a freshly started server runs its first seconds unoptimised (JIT).
  await autocannon({ url, method: "POST", headers, body, connections: 10, duration: 3 });
  // (1) the demo hall as the issue states it: the same document again and again, as a
  // board sized twice or an issued revision opened by a site team — answered from the
  // results cache after the first request (lib/persistence/size.ts).
  // Three rounds, the median round reported (by requests/s): on a shared 2-core machine one
  // round can land on a noisy neighbour's burst; every round is printed.
  const rounds: CannonResult[] = [];
  for (let i = 0; i < 3; i++) rounds.push(await autocannon({ url, method: "POST", headers, body, connections: 10, duration }));
  const same = [...rounds].sort((a, b) => a.requests.average - b.requests.average)[1]!;
  // (2) no cache: every request a different document (the first pipe 1 mm longer each
  // time), so every answer is computed by the engine.
  const doc = JSON.parse(body) as { pipes: { lengthM: number }[] };
  const baseLength = doc.pipes[0]!.lengthM;
  let n = 0;
  const distinct = await autocannon({
    url,
    connections: 10,
    duration,
    requests: [{ method: "POST", headers, setupRequest: (req: Record<string, unknown>) => {
      doc.pipes[0]!.lengthM = baseLength + ++n / 1000;
      return { ...req, body: JSON.stringify(doc) };
    } }],
  });
  console.log(`  10 connections, ${duration} s per round, after a 3 s warm-up; cached: median of 3 rounds\n`);
  console.log(`  ${"".padEnd(34)} ${pad("req/s", 7)} ${pad("p99", 8)} ${pad("mean", 9)} ${pad("non-2xx", 8)}  target ≥ 200 req/s, p99 < 50 ms`);
  const row = (label: string, r: CannonResult, judged: boolean) => {
    const ok = r.requests.average >= 200 && r.latency.p99 < 50 && r.non2xx === 0 && r.errors === 0;
    console.log(
      `  ${label.padEnd(34)} ${pad(r.requests.average.toFixed(0), 7)} ${pad(`${r.latency.p99} ms`, 8)} ${pad(`${r.latency.average.toFixed(1)} ms`, 9)} ${pad(r.non2xx + r.errors + r.timeouts, 8)}  ${judged ? passFail(ok) : "(no target)"}`,
    );
    return ok;
  };
  rounds.forEach((r, i) => row(`  round ${i + 1}`, r, false));
  const ok = row("demo hall, same document (cached)", same, true);
  row("a new document every request", distinct, false);
  return ok ? ("pass" as const) : ("fail" as const);
}

/** BENCH_ONLY=solver,calc… runs only those sections (engine, draft, solver, calc, optimise, report, api, board). */
const only = new Set((process.env.BENCH_ONLY ?? "").split(",").filter(Boolean));
const want = (section: string) => only.size === 0 || only.has(section);

async function main() {
  const engineOk = !want("engine") || benchEngine();
  const draftOk = !want("draft") || benchDraft();
  const epanetSizes = (process.env.BENCH_EPANET_SIZES ?? "1000,10000").split(",").map(Number).filter((n) => n > 0);
  const solverOk = !want("solver") || (await benchSolverVsEpanet(epanetSizes));
  const jsonOk = !want("calc") || benchCalcVsJson(2000);
  const optimiseOk = !want("optimise") || benchOptimiseHall();
  const reportOk = !want("report") || (await benchHandoverReport());
  const api = want("api") ? await benchApi() : "skipped";
  if (want("board")) await benchBoard((process.env.BENCH_URL ?? "http://localhost:3000").replace(/\/$/, ""));
  const ok = engineOk && draftOk && solverOk && jsonOk && optimiseOk && reportOk && api !== "fail";
  console.log(`\n${ok ? "All measured targets met" : "Some targets missed (see FAIL above)"}${api === "skipped" ? " (API not measured)." : "."}`);
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
