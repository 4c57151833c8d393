import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import { MILLBROOK, shots, signInAs } from "./helpers/board";
import { caughtMail } from "./helpers/mail";

// The handover pack in the browser: opened from the project page, the materials list with a
// changed allowance downloaded as CSV, a bad price list refused by line, the report sent to
// the client's address and caught with its cautions' first line.

test("designer opens the handover pack, downloads the materials CSV and sends the report", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "designer");
  await page.goto(`/projects/${MILLBROOK}`);
  await page.getByTestId("handover-link").first().click();
  await page.waitForURL(/\/handover/);
  await expect(page.getByRole("heading", { name: "Handover pack" })).toBeVisible();
  await expect(page.getByTestId("materials-table")).toContainText("Copper pipe 28");

  // the allowance changes the order lengths and the CSV
  await page.getByTestId("allowance").fill("15");
  await expect(page.getByTestId("materials-csv")).toHaveAttribute("href", /allowance=15/);
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("materials-csv").click()]);
  const rows = Papa.parse<Record<string, string>>(readFileSync((await download.path())!, "utf8"), { header: true, skipEmptyLines: true }).data;
  const pipes = rows.filter((r) => r.kind === "pipe");
  expect(pipes.length).toBeGreaterThan(0);
  for (const r of pipes) {
    expect(r.allowancePct).toBe("15");
    // to order: drawn + 15 %, written to the centimetre
    expect(Math.abs(Number(r.orderQuantity) - Number(r.lengthM) * 1.15)).toBeLessThanOrEqual(0.005 + 1e-9);
  }

  // a price list with a bad row is refused, by line and column, and nothing changes
  await page.getByTestId("price-list-file").setInputFiles({ name: "prices.csv", mimeType: "text/csv",
    buffer: Buffer.from("code,description,unit,price\nCU28,Copper tube 28mm,m,5.20\nCU22,Copper tube 22mm,m,abc\n") });
  await expect(page.getByTestId("price-list-issues")).toContainText("Line 3, price");
  await page.screenshot({ path: `${shots}/handover-laptop.png`, fullPage: true });

  // Send: the client's address is the project's; the e-mail arrives with the caution line
  await expect(page.getByTestId("handover-to")).toHaveValue("trustees@millbrook-hall.example");
  await page.getByTestId("handover-send").click();
  await expect(page.getByTestId("handover-result")).toContainText("Sent to trustees@millbrook-hall.example", { timeout: 20_000 });
  const mail = await caughtMail((m) => m.subject.startsWith("Handover report: Millbrook Community Hall"), "trustees@millbrook-hall.example");
  expect(mail.text).toContain("design aids, to be checked by a competent person");

  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: `${shots}/handover-phone.png`, fullPage: true });
});
