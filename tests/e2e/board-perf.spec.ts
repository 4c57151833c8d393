import { expect, test, type Page } from "@playwright/test";
import { MILLBROOK, signInAs, sql } from "./helpers/board";

// Speed of the canvas with 1,000 parts and 1,200 pipes (generated in the page): median and
// 95th-percentile frame time (requestAnimationFrame deltas) during a pan and a zoom, at a
// working zoom (100 %) and fitted (everything on screen), and the time a designer waits to
// open the Millbrook demo hall's real board page until its parts are on screen and the canvas
// answers input. Targets (16 ms median, 1.5 s open) are printed, not asserted: CI machines vary.
// Chromium runs with its frame-rate cap off (no vsync): at 60 Hz a rAF delta can never be
// below 16.7 ms, so capped deltas would only say "at least one frame"; uncapped, a delta is
// what the frame really cost (script, style, layout, paint). Two ways of moving:
// - frame cost: the view changes on every animation frame, so each delta is one frame's work —
//   the number held against the 16 ms target;
// - pointer-driven: real mouse drags and wheel steps; frames then come as fast as the input
//   events do (~60 a second here), so the median shows the input pace, and p95 shows hitches.
test.use({
  launchOptions: {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
      "--disable-gpu-vsync", "--disable-frame-rate-limit"],
  },
});

/**
 * Open a page and return the ms from its navigation start until the part `partId` is drawn on
 * screen and hydrated (React has attached its handlers, so the canvas answers input). Polled
 * on every animation frame in the page, so the number carries no test-runner overhead.
 */
async function openUntilInteractive(page: Page, url: string, partId: string): Promise<number> {
  await page.goto(url, { waitUntil: "commit" });
  const ms = await page.waitForFunction((id) => {
    const el = document.querySelector(`.react-flow__node[data-id="${id}"]`);
    if (!el) return false;
    const r = el.getBoundingClientRect();
    // zoomed far out the parts are drawn on the overview canvas instead of as elements
    const drawn = document.querySelector('[data-testid="board-overview"]') !== null;
    const onScreen = drawn || (r.width > 0 && r.height > 0 && r.right > 0 && r.bottom > 0 && r.left < innerWidth && r.top < innerHeight);
    const hydrated = Object.keys(el).some((k) => k.startsWith("__reactFiber"));
    return onScreen && hydrated ? performance.now() : false;
  }, partId, { polling: "raf", timeout: 60_000 });
  return (await ms.jsonValue()) as number;
}

/** Record requestAnimationFrame deltas while `drive` runs real pointer input. */
async function frameTimes(page: Page, drive: () => Promise<void>) {
  await page.evaluate(() => {
    const w = window as unknown as { __frames: number[]; __recording: boolean };
    w.__frames = [];
    w.__recording = true;
    let last = performance.now();
    const step = (now: number) => {
      w.__frames.push(now - last);
      last = now;
      if (w.__recording) requestAnimationFrame(step);
    };
    requestAnimationFrame(step);
  });
  await drive();
  return page.evaluate(() => {
    const w = window as unknown as { __frames: number[]; __recording: boolean };
    w.__recording = false;
    return w.__frames.slice(2);
  });
}

/** Strict variant: the view changes on every animation frame (no idle frames in the sample). */
async function everyFrame(page: Page, kind: "pan" | "zoom", frames = 120) {
  return page.evaluate(
    ([kind, frames]) =>
      new Promise<number[]>((resolve) => {
        const view = window.__lwBoard!.view!;
        const start = view.get();
        const deltas: number[] = [];
        let last = performance.now();
        let i = 0;
        const step = (now: number) => {
          deltas.push(now - last);
          last = now;
          if (kind === "pan") view.panBy(i < frames / 2 ? 8 : -8, i < frames / 2 ? 4 : -4);
          else view.zoomTo(start.zoom * (1 + 0.5 * Math.sin((i / frames) * Math.PI * 2)));
          if (++i < frames) requestAnimationFrame(step);
          else resolve(deltas.slice(2));
        };
        requestAnimationFrame(step);
      }),
    [kind, frames] as const,
  );
}

/** Drag the canvas by an empty spot near its left edge (a pan), the way a designer does. */
async function pan(page: Page, box: { x: number; y: number; width: number; height: number }) {
  const x0 = box.x + 12;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  for (let i = 1; i <= 60; i++) await page.mouse.move(x0 + i * 6, y0 + (i % 20) * 3);
  for (let i = 59; i >= 0; i--) await page.mouse.move(x0 + i * 6, y0 + (i % 20) * 3);
  await page.mouse.up();
}

/** Wheel in and out around the centre (a zoom). */
async function zoom(page: Page, box: { x: number; y: number; width: number; height: number }) {
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  for (let i = 0; i < 30; i++) await page.mouse.wheel(0, -40);
  for (let i = 0; i < 30; i++) await page.mouse.wheel(0, 40);
}

const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))]!;
  return { median: at(0.5), p95: at(0.95), frames: s.length };
};

test("1,000 parts / 1,200 pipes: frame time of pan and zoom, and demo hall open time", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signInAs(page, "designer");

  // The Millbrook "Plant room" schematic as a designer opens it: one warm-up visit (first
  // compile of the route, cold caches), then three measured visits.
  const [hall] = await sql<{ id: string }>("select id from schematics where project_id = $1 and name = 'Plant room'", [MILLBROOK]);
  const hallUrl = `/projects/${MILLBROOK}/schematics/${hall!.id}`;
  await openUntilInteractive(page, hallUrl, "hp");
  const opens: number[] = [];
  for (let i = 0; i < 3; i++) opens.push(await openUntilInteractive(page, hallUrl, "hp"));
  // interactive means it: a click on the heat pump selects it
  await page.locator('.react-flow__node[data-id="hp"]').click();
  await expect(page.locator('.react-flow__node[data-id="hp"] .lw-part-selected')).toBeVisible();

  await page.goto("/board-preview/perf");
  // it opens fitted, below the level-of-detail zoom: the drawing is the overview canvas
  await expect(page.getByTestId("board-overview")).toBeVisible({ timeout: 60_000 });
  const doc = await page.evaluate(() => window.__lwBoard!.getDoc());
  expect(doc.parts).toHaveLength(1000);
  expect(doc.pipes).toHaveLength(1200);

  // at 100 % (a working zoom: a few hundred parts on screen) and fitted (everything on screen)
  // the pane between the parts bin and details; start on an empty spot
  const box = (await page.locator(".react-flow__pane").boundingBox())!;
  // 100 %, the drawing's left edge a little right of the pane's: a working view of ~60 parts
  await page.evaluate(() => window.__lwBoard!.view!.set({ x: 80, y: 40, zoom: 1 }));
  await page.waitForTimeout(500);
  const pan100 = stats(await frameTimes(page, () => pan(page, box)));
  const zoom100 = stats(await frameTimes(page, () => zoom(page, box)));
  // the strict runs start from the same working view as the pointer runs did
  const working = () => page.evaluate(() => window.__lwBoard!.view!.set({ x: 80, y: 40, zoom: 1 }));
  await working();
  const strictPan100 = stats(await everyFrame(page, "pan"));
  await working();
  const strictZoom100 = stats(await everyFrame(page, "zoom"));
  await page.evaluate(() => window.__lwBoard!.view!.fit());
  await page.waitForTimeout(500);
  const panAll = stats(await frameTimes(page, () => pan(page, box)));
  const zoomAll = stats(await frameTimes(page, () => zoom(page, box)));
  const strictPanAll = stats(await everyFrame(page, "pan"));
  const strictZoomAll = stats(await everyFrame(page, "zoom"));
  // fitted is below the level-of-detail zoom: all parts drawn on the overview canvas, else as elements
  const overview = await page.getByTestId("board-overview").count();
  const onScreen = overview ? doc.parts.length : await page.locator(".react-flow__node").count();

  const line = (name: string, s: ReturnType<typeof stats>) =>
    `${name}: median ${s.median.toFixed(1)} ms, p95 ${s.p95.toFixed(1)} ms over ${s.frames} frames`;
  console.log(
    [
      `[board-perf] 1,000 parts / 1,200 pipes; pointer-driven (frames paced by the input events, ~60/s):`,
      line("pan at 100 %", pan100),
      line("zoom around 100 %", zoom100),
      line(`pan fitted (${onScreen} parts ${overview ? "drawn on the overview canvas" : "as elements"})`, panAll),
      line("zoom fitted", zoomAll),
      `[board-perf] frame cost (view changed on every frame; target median < 16 ms):`,
      line("pan at 100 %", strictPan100),
      line("zoom around 100 %", strictZoom100),
      line("pan fitted", strictPanAll),
      line("zoom fitted", strictZoomAll),
      `[board-perf] Millbrook demo hall board page, navigation → parts on screen and interactive (after a warm-up visit): ` +
        `median ${stats(opens).median.toFixed(0)} ms of ${opens.map((o) => o.toFixed(0)).join(", ")} (target < 1500 ms)`,
    ].join("\n"),
  );
  await page.waitForTimeout(300); // the overview redraws sharp once the view is still
  await page.screenshot({ path: "test-results/screens/board-perf.png" });

  // far out a part is a box on the overview canvas: a click on it still selects it
  await page.evaluate(() => window.__lwBoard!.view!.fit());
  await page.waitForTimeout(300);
  const target = await page.evaluate(() => {
    const b = window.__lwBoard!;
    const part = b.getDoc().parts[500]!;
    const v = b.view!.get();
    const pane = document.querySelector(".react-flow__pane")!.getBoundingClientRect();
    return { id: part.id, x: pane.left + v.x + part.x * v.zoom, y: pane.top + v.y + part.y * v.zoom };
  });
  await page.mouse.click(target.x, target.y);
  await expect.poll(() => page.evaluate(() => window.__lwBoard!.store.getState().selection.parts)).toEqual([target.id]);
  expect(onScreen).toBeGreaterThan(0);
});

/**
 * Side by side of the demo hall against a changed copy (issue 10): ms from navigation until
 * both drawings are on screen with their parts and the numbers table is shown. Warm: the
 * first visit compiles and sizes; the measured visits read kept or cached results.
 */
test("side by side: demo hall against a changed copy, navigation → both canvases and the table", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signInAs(page, "designer");
  const [hall] = await sql<{ id: string }>("select id from schematics where project_id = $1 and name = 'Plant room'", [MILLBROOK]);
  const made = await page.request.post(`/api/v1/projects/${MILLBROOK}/schematics`, {
    data: { name: `Plant room, changed ${Date.now()}`, kind: "team", from: `schematic:${hall!.id}` }, headers: { origin: new URL(page.url()).origin } });
  expect(made.status()).toBe(201);
  const copy = (await made.json()).schematic.id as string;
  try {
    // the copy changed as a designer would: two pipes a size up, one longer, a part's Kv
    const view = await (await page.request.get(`/api/v1/schematics/${copy}`)).json();
    const doc = structuredClone(view.doc);
    doc.pipes[0].lengthM += 5;
    doc.pipes[3].size = doc.pipes[3].material === "copper" ? "35" : doc.pipes[3].size;
    doc.pipes[7].lengthM *= 2;
    const valve = doc.parts.find((p: { props: { kv?: unknown } }) => typeof p.props.kv === "number");
    if (valve) valve.props.kv = valve.props.kv * 1.5;
    expect((await page.request.put(`/api/v1/schematics/${copy}`, { data: { lockVersion: view.schematic.lockVersion, doc }, headers: { origin: new URL(page.url()).origin } })).status()).toBe(200);
    const url = `/projects/${MILLBROOK}/compare?a=schematic:${hall!.id}&b=schematic:${copy}`;
    const shown = async () => {
      await page.goto(url, { waitUntil: "commit" });
      const ms = await page.waitForFunction(() => {
        const pane = (s: string) => document.querySelectorAll(`[data-testid=compare-canvas-${s}] [data-testid=compare-drawing] [data-part]`).length > 0;
        const table = document.querySelector("[data-testid=compare-metrics] tbody tr");
        const box = table?.getBoundingClientRect();
        const canvas = document.querySelector("[data-testid=compare-canvas-b]");
        const hydrated = canvas !== null && Object.keys(canvas).some((k) => k.startsWith("__reactFiber"));
        return pane("a") && pane("b") && box && box.height > 0 && hydrated ? performance.now() : false;
      }, null, { polling: "raf", timeout: 60_000 });
      return (await ms.jsonValue()) as number;
    };
    await shown(); // warm-up: compiles the route, sizes both (results kept or cached after)
    const times: number[] = [];
    for (let i = 0; i < 3; i++) times.push(await shown());
    console.log(`[board-perf] side by side, Millbrook demo hall (${doc.parts.length} parts, ${doc.pipes.length} pipes) against a changed copy, ` +
      `navigation → both canvases and the table (warm): median ${stats(times).median.toFixed(0)} ms of ${times.map((t) => t.toFixed(0)).join(", ")} (target < 1500 ms)`);
    await page.screenshot({ path: "test-results/screens/compare-perf.png" });
  } finally {
    await sql("delete from schematics where id = $1", [copy]);
  }
});
