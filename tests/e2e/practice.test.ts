import { afterAll, beforeAll, expect, test } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Locator, Page } from "playwright-core";
import { PHONE, SHOTS_DIR, openBrowser, refusedStatus, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/** Expected refusals (Chromium logs each as a failed resource); any other console error fails the test. */

async function panelShot(locator: Locator, name: string) {
  fs.mkdirSync(SHOTS_DIR, { recursive: true });
  await locator.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`) });
}

/** The make-rate table's row for a band, as "made / attempts". */
async function bandCount(page: Page, band: string): Promise<string> {
  const row = page
    .getByRole("table", { name: "Make rate by distance band" })
    .getByRole("row")
    .filter({ has: page.getByRole("rowheader", { name: band, exact: true }) });
  return ((await row.getByRole("cell").first().textContent()) ?? "").replace(/\s+/g, " ").trim();
}

test("on a phone a player logs a short session, sees the 0–3 ft band change, imports a CSV and exports it", async () => {
  const browser = await openBrowser(PHONE);
  // The CSV import's check answers a file with bad rows with a 422 (shown under the upload), as the test means it to.
  browser.allow(refusedStatus(422));
  const { page } = browser;
  try {
    // Sign up through the UI.
    await page.goto(`${server.url}/sign-up`);
    await page.getByLabel("Name").fill("Pia Greenside");
    await page.getByLabel("E-mail").fill("pia@example.test");
    await page.getByLabel("Password").fill("a-good-long-password");
    await page.getByText("I am a player").click();
    await page.getByRole("button", { name: /create/i }).click();
    await page.getByText("Signed in as").first().waitFor({ state: "attached" });

    // A new player's make rates say what to do.
    await page.goto(`${server.url}/stats`);
    await page.getByText("Log a session to see your make rates").waitFor();
    await screenshot(page, "practice-stats-empty-phone");

    // Start a session and log three putts from 2 ft: holed, holed, missed left 12 in short.
    await page.goto(`${server.url}/practice`);
    await page.getByRole("button", { name: "Start logging" }).click();
    await page.waitForURL(/\/practice\/[0-9a-f-]{36}$/);
    await page.getByRole("button", { name: "3", exact: true }).click();
    await page.getByRole("button", { name: "Shorter by 1 ft" }).click();
    await expect(page.getByRole("group", { name: "Distance" }).textContent()).resolves.toContain("2 ft");
    const holed = page.getByRole("button", { name: "Holed", exact: true });
    // The big buttons are big: at least 56 px tall.
    expect((await holed.boundingBox())!.height).toBeGreaterThanOrEqual(56);
    await holed.click();
    await holed.click();
    await page.getByRole("button", { name: "Left", exact: true }).click();
    await page.getByRole("button", { name: "Short", exact: true }).click();
    await page.getByRole("button", { name: "12", exact: true }).click();
    await page.getByRole("button", { name: /^Missed/ }).click();
    const list = page.getByRole("list", { name: "Putts, newest first" });
    await expect(list.getByRole("listitem").count()).resolves.toBe(3);
    await expect(list.getByRole("listitem").first().textContent()).resolves.toContain("2 ft · Missed left, 12 in short");
    await list
      .getByText("saving…")
      .first()
      .waitFor({ state: "detached" })
      .catch(() => {});
    await page.waitForLoadState("networkidle");
    await expect(list.getByText(/saving|waiting/).count()).resolves.toBe(0);
    await screenshot(page, "practice-logging-phone");
    await page.screenshot({ path: path.join(SHOTS_DIR, "practice-logging-phone-first-screen.png") });

    // The 0–3 ft band went from nothing to 2 of 3.
    await page.goto(`${server.url}/stats`);
    await page.getByRole("table", { name: "Make rate by distance band" }).waitFor();
    expect(await bandCount(page, "0–3 ft")).toBe("2 / 3");
    expect(await bandCount(page, "3–6 ft")).toBe("0 / 0");
    await page.getByText("based on 3 putts — wide interval").first().waitFor();
    await page.getByText("Tour one-putt rates: M. Broadie, Every Shot Counts (2014), as quoted.").waitFor();
    await page.locator(".recharts-surface").first().waitFor();
    await panelShot(
      page.locator("section", { has: page.getByRole("heading", { name: "Make rate by distance" }) }),
      "practice-stats-band-phone",
    );

    // Import a small CSV with one bad row: the report names it, then the valid rows go in.
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-csv-"));
    const csv = path.join(dir, "my-putts.csv");
    fs.writeFileSync(
      csv,
      ["Date,Distance (ft),Made,Side", "2024-05-01,2,yes,", "2024-05-01,2.5,no,left", "2024-05-01,two,yes,"].join("\n"),
    );
    await page.goto(`${server.url}/practice/import`);
    await page.getByLabel("CSV file").setInputFiles(csv);
    await page.getByRole("heading", { name: "my-putts.csv" }).waitFor();
    await expect(page.getByLabel("Distance (required)").inputValue()).resolves.toBe("Distance (ft)");
    await page.getByRole("button", { name: "Import 3 rows" }).click();
    const report = page.getByRole("table", { name: "Rows that could not be imported" });
    await report.waitFor();
    await expect(report.getByRole("row").nth(1).textContent()).resolves.toMatch(/^34Distance"two" is not a number$/);
    await screenshot(page, "practice-import-errors-phone");
    await page.getByRole("button", { name: "Import the 2 valid rows only" }).click();
    await page.getByText("Imported 2 putts").waitFor();

    // Export the putts: the file holds the three logged and the two imported.
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export putts (CSV)" }).click()]);
    expect(download.suggestedFilename()).toMatch(/^borrowline-putts-\d{4}-\d{2}-\d{2}\.csv$/);
    const saved = path.join(dir, download.suggestedFilename());
    await download.saveAs(saved);
    const lines = fs.readFileSync(saved, "utf8").trim().split(/\r?\n/);
    expect(lines[0]).toBe("date,green,distance_m,holed,miss_side,miss_length_m,break_type,session_id,putt_id");
    expect(lines).toHaveLength(1 + 5);
    expect(lines.filter((l) => l.startsWith("2024-05-01,"))).toHaveLength(2);

    // And the make rates count the imported putts too.
    await page.goto(`${server.url}/stats`);
    await page.getByRole("table", { name: "Make rate by distance band" }).waitFor();
    expect(await bandCount(page, "0–3 ft")).toBe("3 / 5");
  } finally {
    await browser.close();
  }
});
