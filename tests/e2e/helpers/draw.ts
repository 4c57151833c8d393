import { expect, type Page } from "@playwright/test";

// Drawing-board steps by pointer, as a designer would: parts dragged from the parts bin,
// pipes dragged from port to port. Board-2's sizing/saving tests can reuse drawSmallSystem.

/** Drop a part from the parts bin at canvas position (x, y) in screen pixels from the canvas's top-left. */
export async function dropPart(page: Page, type: string, x: number, y: number) {
  const canvas = page.getByTestId("board-canvas");
  await page.locator(`[data-testid=parts-bin] [data-part="${type}"]`).dragTo(canvas, { targetPosition: { x, y } });
}

const handle = (page: Page, ref: string) => {
  const [node, port] = ref.split(".");
  return page.locator(`.react-flow__node[data-id="${node}"] .react-flow__handle[data-handleid="${port}"]`);
};

async function centre(page: Page, ref: string) {
  const box = await handle(page, ref).boundingBox();
  if (!box) throw new Error(`port ${ref} is not on screen`);
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

/** Drag a pipe from one port to another. */
export async function pipe(page: Page, from: string, to: string) {
  const a = await centre(page, from);
  const b = await centre(page, to);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 4 });
  await page.mouse.move(b.x, b.y, { steps: 4 });
  await page.mouse.up();
}

export const boardDoc = (page: Page) =>
  page.evaluate(() => window.__lwBoard!.getDoc()) as Promise<{ parts: { id: string; type: string }[]; pipes: { id: string; from: string; to: string; lengthM: number }[] }>;

/** Heat pump, pump, two zones (zone valve + radiator), bypass and vessel, joined by tees. */
export const smallSystem = {
  parts: [
    ["heat-pump", 90, 300], ["pump", 220, 140], ["tee", 340, 140], ["tee", 460, 140], ["zone-valve", 580, 140], ["zone-valve", 460, 260],
    ["radiator", 740, 200], ["radiator", 620, 340], ["dp-bypass-valve", 340, 320], ["tee", 460, 480], ["tee", 340, 480], ["tee", 220, 480],
    ["expansion-vessel", 220, 600],
  ] as [string, number, number][],
  pipes: [
    ["hp1.flow", "pump1.in"], ["pump1.out", "t1.a"], ["t1.b", "t2.a"], ["t2.b", "zv1.a"], ["t2.c", "zv2.a"], ["zv1.b", "rad1.flow"],
    ["zv2.b", "rad2.flow"], ["rad1.return", "t3.b"], ["rad2.return", "t3.c"], ["t3.a", "t4.b"], ["t1.c", "bp1.a"], ["bp1.b", "t4.c"],
    ["t4.a", "t5.b"], ["t5.a", "hp1.return"], ["t5.c", "ev1.connection"],
  ] as [string, string][],
};

export async function drawSmallSystem(page: Page) {
  for (const [type, x, y] of smallSystem.parts) await dropPart(page, type, x, y);
  await expect(page.locator(".react-flow__node")).toHaveCount(smallSystem.parts.length);
  for (const [from, to] of smallSystem.pipes) await pipe(page, from, to);
  await expect(page.locator(".react-flow__edge")).toHaveCount(smallSystem.pipes.length);
}
