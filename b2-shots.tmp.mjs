import { chromium } from "@playwright/test";
const base = "http://localhost:3400";
const out = "/tmp/b2shots";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu"] });
async function signIn(role, viewport = { width: 1366, height: 820 }) {
  const ctx = await browser.newContext({ viewport });
  const page = await ctx.newPage(); page.setDefaultTimeout(180000); page.setDefaultNavigationTimeout(180000);
  page.on("pageerror", (e) => console.log("pageerror", e.message));
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail address").fill(`${role}@fernbank.example`);
  await page.getByLabel("Password").fill(`copper-loop-${role}`);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(/projects/);
  return { ctx, page };
}
{ // designer on the issued Millbrook schematic
  const { ctx, page } = await signIn("designer");
  await page.goto(`${base}/projects/6a0f3c1e-0000-4000-8000-000000000101`);
  await page.getByRole("link", { name: "Plant room" }).first().click();
  await page.waitForSelector("[data-testid=drawing-board]");
  await page.waitForTimeout(1500);
  await page.screenshot({ path: `${out}/issued-readonly.png` });
  // units: switch to l/s and m head, size, report
  await page.getByLabel("Flow unit").selectOption("l/s");
  await page.getByLabel("Pressure unit").selectOption("m");
  await page.getByTestId("size-it").click();
  await page.getByRole("button", { name: /^Findings/ }).waitFor();
  await page.getByRole("tab", { name: "Sizing report" }).click();
  await page.waitForTimeout(800);
  await page.screenshot({ path: `${out}/units-report.png` });
  await page.getByLabel("Flow unit").selectOption("m3/h");
  await page.getByLabel("Pressure unit").selectOption("kPa");
  await page.waitForTimeout(800);
  await ctx.close();
}
{ // reviewer on the in-review schematic
  const { ctx, page } = await signIn("reviewer");
  await page.goto(`${base}/projects/6a0f3c1e-0000-4000-8000-000000000102`);
  await page.getByRole("link", { name: "Bypass only" }).first().click();
  await page.waitForSelector("[data-testid=drawing-board]");
  await page.waitForTimeout(1000);
  await page.screenshot({ path: `${out}/reviewer-board.png`, clip: { x: 0, y: 0, width: 1366, height: 160 } });
  await ctx.close();
}
{ // designer: save revision dialog on the draft schematic
  const { ctx, page } = await signIn("designer");
  await page.goto(`${base}/projects/6a0f3c1e-0000-4000-8000-000000000102`);
  await page.getByRole("link", { name: "With 40 L buffer" }).first().click();
  await page.waitForSelector("[data-testid=drawing-board]");
  await page.waitForTimeout(1000);
  await page.getByRole("button", { name: "Save revision" }).click();
  await page.waitForTimeout(300);
  await page.screenshot({ path: `${out}/save-revision.png` });
  await ctx.close();
}
{ // trainee project page on a phone
  const { ctx, page } = await signIn("trainee", { width: 390, height: 844 });
  await page.goto(`${base}/projects/6a0f3c1e-0000-4000-8000-000000000102`);
  await page.waitForSelector("[data-testid=schematic-list]");
  await page.screenshot({ path: `${out}/trainee-project.png`, fullPage: true });
  await ctx.close();
}
await browser.close();
