import { afterAll, beforeAll, expect, test } from "vitest";
import path from "node:path";
import type { Locator } from "playwright-core";
import { DESKTOP, PHONE, SHOTS_DIR, openBrowser, refusedStatus, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/** One panel at full resolution (a full-page phone shot is too tall to read). */
async function panelShot(locator: Locator, name: string) {
  await locator.screenshot({ path: path.join(SHOTS_DIR, `${name}.png`) });
}

test("a signed-out golfer reads a putt on a phone, and the same link in a fresh browser shows the same read", async () => {
  const phone = await openBrowser(PHONE);
  let shared = "";
  let headline = "";
  let flatPutt = "";
  try {
    const { page } = phone;
    await page.goto(`${server.url}/read`);
    // The defaults are written into the address at once, so even a bare /read can be shared.
    await page.waitForURL(/\/read\?d=3\.048&s=2&f=90&st=10&rp=0\.4318/);
    await page.getByTestId("aim-headline").waitFor();
    expect(await page.getByTestId("aim-headline").textContent()).toMatch(/outside the left edge/);
    await screenshot(page, "read-phone-default");
    // What the golfer sees first, with the answer bar at the bottom of the screen.
    await page.screenshot({ path: path.join(SHOTS_DIR, "read-phone-first-screen.png") });
    await panelShot(page.locator("#answer"), "read-phone-answer");
    await panelShot(page.getByRole("form", { name: "The putt" }), "read-phone-form");

    await page.getByLabel("Distance (ft)").fill("20");
    // Tap the named direction's card as a golfer would (the radio inside it is visually hidden).
    await page.locator("label", { hasText: /^Uphill, falls left$/ }).click();
    await page.waitForURL(/d=6\.096&s=2&f=225&st=10/);
    await page.getByText("Breaks right to left", { exact: true }).waitFor();
    await page
      .getByRole("status")
      .filter({ hasText: "Updating" })
      .waitFor({ state: "detached" })
      .catch(() => {});
    headline = (await page.getByTestId("aim-headline").textContent()) ?? "";
    expect(headline).toMatch(/outside the right edge/);
    flatPutt = (await page.getByText(/^Hit it as hard as a flat/).textContent()) ?? "";
    expect(flatPutt).toMatch(/^Hit it as hard as a flat \d+ ft( \d+ in)? putt$/);
    shared = page.url();
    await screenshot(page, "read-phone-20ft-uphill-left");
  } finally {
    await phone.close();
  }

  const desktop = await openBrowser(DESKTOP);
  try {
    const { page } = desktop;
    await page.goto(shared);
    await page.getByTestId("aim-headline").waitFor();
    expect(await page.getByLabel("Distance (ft)").inputValue()).toBe("20");
    expect(await page.getByRole("slider", { name: "Which way the green falls" }).getAttribute("aria-valuenow")).toBe("225");
    await page.getByText("Breaks right to left", { exact: true }).waitFor();
    expect(await page.getByTestId("aim-headline").textContent()).toBe(headline);
    expect(await page.getByText(/^Hit it as hard as a flat/).textContent()).toBe(flatPutt);
    expect(new URL(page.url()).search).toBe(new URL(shared).search);
    await screenshot(page, "read-desktop-shared-link");
  } finally {
    await desktop.close();
  }
});

test("a slope too steep for the green speed is answered as 'would not stop', not as a failure", async () => {
  const browser = await openBrowser(DESKTOP);
  // The server answers a ball that cannot stop with a 422, which Chromium logs as a failed resource.
  browser.allow(refusedStatus(422));
  try {
    const { page } = browser;
    await page.goto(`${server.url}/read?d=3&s=8&f=90&st=10&rp=0.45`);
    await page.locator("#answer").getByText("This ball would not stop").waitFor();
    expect(await page.getByText(/On an 8 % slope at Stimp 10 the ball would not stop — the steepest it stops on is 7\.9 %/).count()).toBe(
      1,
    );
    await screenshot(page, "read-desktop-cannot-stop");
  } finally {
    await browser.close();
  }
});

test("the break chart shows the aim-spot picture first and a table of 10 distances by 12 directions, on a phone and on a desktop", async () => {
  for (const [viewport, name] of [
    [DESKTOP, "desktop"],
    [PHONE, "phone"],
  ] as const) {
    const browser = await openBrowser(viewport);
    try {
      const { page } = browser;
      await page.goto(`${server.url}/chart?s=2&st=10&rp=0.4318`);
      const picture = page.getByRole("img", { name: /Aim spots all round the hole/ });
      await picture.locator("g[data-ring]").first().waitFor();
      expect(await picture.locator("g[data-ring]").count()).toBe(5);
      // Every word drawn in the picture is at least 12 px tall on screen, and the picture fits the page.
      const type = await picture.evaluate((svg) => {
        const scale = svg.getBoundingClientRect().width / 360;
        return { smallest: Math.min(...[...svg.querySelectorAll("text")].map((t) => Number(t.getAttribute("font-size")) * scale)) };
      });
      expect(type.smallest).toBeGreaterThanOrEqual(12);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      // No card words: the old "yardage book" offer is gone.
      expect(await page.getByText(/yardage/i).count()).toBe(0);
      const table = page.getByRole("table");
      await table.waitFor();
      expect(await table.locator("tbody tr").count()).toBe(10);
      expect(await table.locator("tbody td").count()).toBe(120);
      expect(await table.locator("thead th[scope=col]").count()).toBe(13);
      expect(await table.locator("tbody tr").first().locator("th").textContent()).toBe("3 ft");
      // The graph arrives in its own chunk after the table.
      await page.locator("path.recharts-line-curve").first().waitFor({ state: "attached", timeout: 15_000 });
      // Seven lines by default: straight downhill round the right-hand side to straight uphill.
      expect(await page.locator("path.recharts-line-curve").count()).toBe(7);
      await screenshot(page, `chart-${name}`);
      if (name === "desktop") {
        await page.emulateMedia({ media: "print" });
        expect(await page.getByRole("navigation", { name: "Main" }).first().isVisible()).toBe(false);
        expect(await page.getByRole("form", { name: "Chart settings" }).isVisible()).toBe(false);
        expect(await table.isVisible()).toBe(true);
        // A4 portrait with 12 mm margins leaves 186 mm, about 703 CSS px: the whole table must fit across.
        await page.setViewportSize({ width: 703, height: 1000 });
        expect(await table.evaluate((el) => el.scrollWidth)).toBeLessThanOrEqual(703);
        await screenshot(page, "chart-print-a4");
        await page.setViewportSize(DESKTOP);
        await page.emulateMedia({ media: "screen" });
      }
    } finally {
      await browser.close();
    }
  }
});
