// Where a page opens scrolled to, in a phone-sized Chromium: a page loaded fresh opens at its top, whatever the tab
// showed before; Back to a page keeps its place (src/app/scroll-positions.ts).
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import type { TestServer } from "../setup/server";
import { PHONE, appRunning, openBrowser, startAppServer, type Browser } from "./harness";

let server: TestServer;
let browser: Browser;
beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
  browser = await openBrowser(PHONE);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const scrollY = (page: Page) => page.evaluate(() => window.scrollY);

/** Scrolls the page to `y` and waits until the browser has it there. */
async function scrollTo(page: Page, y: number) {
  await page.evaluate((to) => window.scrollTo(0, to), y);
  await page.waitForFunction((to) => Math.abs(window.scrollY - to) < 2, y);
}

test("a page loaded fresh after a scrolled one opens at its top; Back to a page keeps its place", async () => {
  const page = browser.page;
  // A read scrolled down to its answer (the drawn /read is taller than two phone screens).
  await page.goto(`${server.url}/read`);
  await appRunning(page);
  await scrollTo(page, 900);

  // Then a fresh load of another page, as from an e-mail's link or the address bar: it opens at its top. It opened
  // as far down as it goes when React Router kept every fresh load's place under one key.
  await page.goto(`${server.url}/sign-in`);
  await page.getByRole("button", { name: "Sign in" }).waitFor();
  expect(await scrollY(page)).toBe(0);

  // Back to the read by a fresh load too: the top, not the place left earlier in this tab.
  await page.goto(`${server.url}/read`);
  await appRunning(page);
  expect(await scrollY(page)).toBe(0);

  // In the app, Back still brings the golfer to where they were: down the read, off to Rehearse, and back.
  await scrollTo(page, 900);
  await page
    .getByRole("link", { name: "Rehearse", exact: true })
    .first()
    .evaluate((a: HTMLElement) => a.click());
  await page.waitForURL(/\/rehearse/);
  await page.getByRole("heading", { level: 1 }).waitFor();
  await page.goBack();
  await page.waitForURL(/\/read/);
  await page.waitForFunction(() => Math.abs(window.scrollY - 900) < 2, undefined, { timeout: 10_000 });

  expect(browser.unexpected()).toEqual([]);
});
