// Issue 8 in a real browser: a player uploads a green's height map through the UI, taps the ball and the hole on the
// map and gets the read rolled on that surface; on /read the player's own odds show a probability and 100 finishes.
import path from "node:path";
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { mapLayout } from "../../src/features/green-maps/utils/map-view";
import { DESKTOP, PHONE, SHOTS_DIR, openBrowser, refusedStatus, screenshot as fullPageShot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

const SADDLE = path.resolve("tests/fixtures/height-maps/tilted-saddle.csv");
// The saddle fixture: 25 × 25 heights 0.5 m apart from (0, 0), i.e. 12 m × 12 m.
const SADDLE_LAYOUT = mapLayout({ minX: 0, maxX: 12, minY: 0, maxY: 12 });

/** Signs up in the page (the session cookie lands in this browser) and creates a green with a Stimp reading. */
async function signUpWithGreen(page: Page, name: string): Promise<string> {
  await page.goto(`${server.url}/`);
  return page.evaluate(async (greenName) => {
    const post = async (url: string, body: unknown) => {
      const res = await fetch(url, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(body) });
      if (!res.ok) throw new Error(`${url}: ${res.status} ${await res.text()}`);
      return res.json();
    };
    const email = `map-${Date.now()}-${Math.random().toString(36).slice(2, 7)}@example.test`;
    await post("/api/auth/sign-up/email", { name: "Ruth Tester", email, password: "correct-horse-battery", accountType: "player" });
    const green = await post("/api/greens", { name: greenName });
    await post(`/api/greens/${green.id}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 9.5 });
    return green.id as string;
  }, name);
}

/** Full-page screenshots from the top, so the sticky top bar is where a reader expects it. */
async function screenshot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.waitForTimeout(150);
  return fullPageShot(page, name);
}

/** A tap on the map at (xM, yM) metres of the green. */
async function tapMap(page: Page, xM: number, yM: number) {
  const map = page.getByTestId("surface-map");
  await map.scrollIntoViewIfNeeded();
  const box = (await map.boundingBox())!;
  const s = box.width / SADDLE_LAYOUT.width;
  await page.mouse.click(box.x + SADDLE_LAYOUT.toX(xM) * s, box.y + SADDLE_LAYOUT.toY(yM) * s);
}

/**
 * A green without a map makes no GET /api/greens/:id/height-map (its answer says hasHeightMap: false), so no 404 is
 * allowed here: the console stays quiet on a green with no map, and after one is uploaded (issue 18).
 */

test("a player uploads the saddle through the UI, taps the ball and the hole, and sees the read on that surface", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    const greenId = await signUpWithGreen(page, "Saddle green");
    await page.goto(`${server.url}/greens/${greenId}/map`);
    await page.getByRole("form", { name: "Upload a height map" }).waitFor();
    await screenshot(page, "green-map-phone-empty");

    await page.getByLabel("CSV file").setInputFiles(SADDLE);
    await page.getByLabel("Spacing (m)").fill("0.5");
    await page.getByRole("button", { name: "Upload height map" }).click();
    await page.getByTestId("surface-map").waitFor();
    const summary = page.getByRole("region", { name: "The height map" });
    expect(await summary.textContent()).toMatch(/25 × 25 heights/);
    // Slope as equal ticks coloured by steepness (a saddle has several bands), keyed in the legend; no arrows.
    const ticks = page.locator('[data-testid="slope-ticks"] > g');
    expect(await ticks.count()).toBeGreaterThan(10);
    const bands = await ticks.evaluateAll((gs) => new Set(gs.map((g) => g.getAttribute("data-band"))).size);
    expect(bands).toBeGreaterThanOrEqual(2);
    expect(await page.getByTestId("surface-map").locator("marker").count()).toBe(0);
    await page.getByRole("list", { name: "Slope colours" }).first().waitFor();

    await tapMap(page, 4, 3);
    await expect.poll(() => page.getByTestId("placement").textContent()).toMatch(/^Ball 4\.0 m east, 3\.0 m north · hole not placed/);
    await tapMap(page, 7, 8.5);
    const aim = page.getByTestId("surface-aim");
    await aim.waitFor({ timeout: 20_000 });
    expect(await aim.textContent()).toMatch(/^Aim (\d+(\.\d)? in (left|right) of the hole|straight at the hole)$/);
    expect(await page.getByTestId("surface-flat-putt").textContent()).toMatch(/as hard as a flat .*ft.* putt/);
    await page.getByTestId("surface-line").waitFor({ state: "attached" });
    expect(await page.getByLabel("Stimp (ft)").inputValue()).toBe("9.5");

    // The 3D view of the same surface arrives in its own chunk.
    await page.locator("canvas").first().waitFor({ timeout: 20_000 });
    await page.waitForTimeout(600);
    await screenshot(page, "green-map-phone-read");
    // What the golfer sees right after tapping the hole: the map and the read under it.
    await page.getByTestId("surface-map").scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS_DIR, "green-map-phone-after-tap.png") });
    await page.getByTestId("surface-map").screenshot({ path: path.join(SHOTS_DIR, "green-map-phone-map.png") });

    // The same green on a desktop, in the same account.
    const cookies = await browser.context.cookies();
    const desktop = await openBrowser(DESKTOP);
    try {
      await desktop.context.addCookies(cookies);
      await desktop.page.goto(`${server.url}/greens/${greenId}/map`);
      await desktop.page.getByTestId("surface-map").waitFor();
      await tapMap(desktop.page, 4, 3);
      await tapMap(desktop.page, 7, 8.5);
      await desktop.page.getByTestId("surface-aim").waitFor({ timeout: 20_000 });
      expect(await desktop.page.getByTestId("surface-aim").textContent()).toBe(await aim.textContent());
      await desktop.page.locator("canvas").first().waitFor({ timeout: 20_000 });
      await desktop.page.getByRole("button", { name: "Behind the ball" }).click();
      await desktop.page.waitForTimeout(600);
      await screenshot(desktop.page, "green-map-desktop-read");
    } finally {
      await desktop.close();
    }
  } finally {
    await browser.close();
  }
});

test("a bad file shows the server's row and column errors under the upload", async () => {
  const browser = await openBrowser(DESKTOP);
  // The refused upload's 400 only.
  browser.allow(refusedStatus(400));
  const { page } = browser;
  try {
    const greenId = await signUpWithGreen(page, "Bad file green");
    await page.goto(`${server.url}/greens/${greenId}/map`);
    await page.getByLabel("CSV file").setInputFiles({ name: "bumpy.csv", mimeType: "text/csv", buffer: Buffer.from("0,0,0\n0,,0\n0,0\n") });
    await page.getByLabel("Spacing (m)").fill("1");
    await page.getByRole("button", { name: "Upload height map" }).click();
    const list = page.getByRole("list", { name: "Problems in the file" });
    await list.waitFor();
    expect(await list.locator("li").allTextContents()).toEqual([
      "Row 2, column 2 is empty (a hole in the grid)",
      "Row 3 has 2 values; row 1 has 3 (every row needs the same number)",
    ]);
    await page.getByRole("form", { name: "Upload a height map" }).screenshot({ path: path.join(SHOTS_DIR, "green-map-upload-errors.png") });
  } finally {
    await browser.close();
  }
});

test("on /read a signed-in player sees their odds with 100 finishes, and the dial's drag is simulated live in a worker", async () => {
  for (const [viewport, name] of [
    [DESKTOP, "desktop"],
    [PHONE, "phone"],
  ] as const) {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signUpWithGreen(page, "Odds green");
      await page.goto(`${server.url}/read?d=3&s=2&f=90&st=10&rp=0.45`);
      const panel = page.getByRole("region", { name: "Your odds from here" });
      const headline = panel.getByTestId("odds-headline");
      await headline.waitFor({ timeout: 20_000 });
      expect(await headline.textContent()).toMatch(/^You hole this (about \d+ %|under 1 %|over 99 %) of the time$/);
      expect(await panel.locator("[data-finish]").count()).toBe(100);
      expect(await panel.getByTestId("odds-basis").textContent()).toBe("No putts logged yet — using typical club-golfer values.");
      await panel.getByTestId("best-pace").waitFor();
      await panel.screenshot({ path: path.join(SHOTS_DIR, `odds-${name}-panel.png`) });
      await screenshot(page, `odds-${name}-read`);

      if (name === "desktop") {
        // Drag the dial's handle part way round: the worker's live estimate appears while the button is held.
        const dial = page.getByRole("slider", { name: "Which way the green falls" });
        await dial.scrollIntoViewIfNeeded();
        const box = (await dial.boundingBox())!;
        const cx = box.x + box.width / 2;
        const cy = box.y + box.height / 2;
        const r = box.width * 0.38;
        await page.mouse.move(cx + r, cy);
        await page.mouse.down();
        for (let a = 0; a <= 60; a += 10) {
          const t = (a * Math.PI) / 180;
          await page.mouse.move(cx + r * Math.cos(t), cy + r * Math.sin(t));
        }
        await panel.getByText(/^Live: 2,000 putts/).waitFor({ timeout: 10_000 });
        expect(await panel.locator("[data-finish]").count()).toBe(100);
        await page.mouse.up();
        await panel.getByText(/^Live: 2,000 putts/).waitFor({ state: "detached", timeout: 10_000 });

        // The best pace goes into the form and the address, once the odds for where the dial was let go have arrived.
        await page.locator('section[aria-label="Your odds from here"][aria-busy="true"]').waitFor({ state: "detached", timeout: 20_000 });
        const button = panel.getByRole("button", { name: /^Use my best pace/ });
        if (await button.count()) {
          await button.click();
          await page.waitForURL(/rp=/);
          await panel.getByText("This read already rolls at your best pace.").waitFor({ timeout: 20_000 });
        }
      }
    } finally {
      await browser.close();
    }
  }
});
