// Issue 18: the read, a logged session and a ladder rung, driven by the keyboard alone (Tab, Shift+Tab, Enter, Space,
// arrows and typing; no clicks). After a link or "Start logging" the focus is on the new page's heading; after
// "Undo last putt" it stays on Undo. page.goto stands for typing an address; everything on a page is keys.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Locator, Page } from "playwright-core";
import { DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import type { TestServer } from "../setup/server";
import { DESKTOP, appRunning, openBrowser, screenshot, startAppServer, type Browser } from "./harness";

// One browser for the three tests, in order: the read signed out, then signed in (by keyboard) a session and a rung.
let server: TestServer;
let browser: Browser;
beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
  browser = await openBrowser(DESKTOP);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const isFocused = (target: Locator) => target.evaluate((el) => el === document.activeElement);

/** Presses Tab (Shift+Tab with `back`) until `target` has the focus; fails after `max` presses. Returns the count. */
async function tabTo(page: Page, target: Locator, { back = false, max = 60 } = {}): Promise<number> {
  await target.waitFor();
  for (let n = 1; n <= max; n++) {
    await page.keyboard.press(back ? "Shift+Tab" : "Tab");
    if (await isFocused(target)) return n;
  }
  throw new Error(`not reached with ${max} ${back ? "Shift+Tab" : "Tab"} presses: ${target.toString()}`);
}

/** The focused element, as "H1: text" — after an in-app navigation it should be the new page's main heading. */
const focused = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement;
    return el ? `${el.tagName}: ${el.textContent?.trim() ?? ""}` : "none";
  });

test("the read by keyboard: type the distance, turn the fall-line dial with the arrows, follow a link with Enter", async () => {
  const { page } = browser;
  await page.goto(`${server.url}/read`);
  // The page comes drawn before its scripts run; keys typed then would be the drawing's, not the app's.
  await appRunning(page);
  const distance = page.getByLabel("Distance (ft)");
  await tabTo(page, distance);
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.type("20");
  await page.keyboard.press("Tab");
  await page.waitForURL(/[?&]d=6\.096\b/);
  const dial = page.getByRole("slider", { name: "Which way the green falls" });
  await tabTo(page, dial);
  const before = Number(await dial.getAttribute("aria-valuenow"));
  for (let i = 0; i < 3; i++) await page.keyboard.press("ArrowRight");
  await expect.poll(async () => Number(await dial.getAttribute("aria-valuenow"))).not.toBe(before);
  const turned = await dial.getAttribute("aria-valuenow");
  await page.waitForURL(new RegExp(`[?&]f=${turned}\\b`));
  await page.getByTestId("aim-headline").waitFor();
  await tabTo(page, page.getByRole("link", { name: "Break chart for this green" }));
  await page.keyboard.press("Enter");
  await page.waitForURL(/\/chart\?/);
  await expect.poll(() => focused(page)).toMatch(/^H1: /);
  expect(new URL(page.url()).searchParams.get("d")).toBe("6.096");
}, 180_000);

test("a logged session by keyboard: sign in, Start logging, Holed by Enter and Space, a miss, Undo keeps the focus", async () => {
  const { page } = browser;
  // Sign in with the form's fields and Enter.
  const ivo = DEMO_PLAYERS[0];
  await page.goto(`${server.url}/sign-in`);
  await tabTo(page, page.getByLabel("E-mail"));
  await page.keyboard.type(ivo.email);
  await page.keyboard.press("Tab");
  expect(await isFocused(page.getByLabel("Password"))).toBe(true);
  await page.keyboard.type(DEMO_PASSWORD);
  await page.keyboard.press("Enter");
  await page.getByText("Signed in as").first().waitFor({ state: "attached" });

  // A logged session: Start logging, Holed (Enter), Holed (Space), a miss left and short, then Undo.
  await page.goto(`${server.url}/practice`);
  await tabTo(page, page.getByRole("button", { name: "Start logging" }));
  await page.keyboard.press("Enter");
  await page.waitForURL(/\/practice\/[0-9a-f-]{36}$/);
  const sessionId = /\/practice\/([0-9a-f-]{36})$/.exec(page.url())![1]!;
  await expect.poll(() => focused(page)).toMatch(/^H1: /);
  const holed = page.getByRole("button", { name: "Holed", exact: true });
  await tabTo(page, holed);
  await page.keyboard.press("Enter");
  await page.keyboard.press("Space");
  const miss = page.getByRole("region", { name: "A miss" });
  await tabTo(page, miss.getByRole("button", { name: "Left", exact: true }));
  await page.keyboard.press("Enter");
  await tabTo(page, miss.getByRole("button", { name: "Short", exact: true }));
  await page.keyboard.press("Space");
  await tabTo(
    page,
    miss
      .getByRole("group", { name: /How far short/ })
      .getByRole("button")
      .first(),
  );
  await page.keyboard.press("Enter");
  await tabTo(page, miss.getByRole("button", { name: /^Missed/ }));
  await page.keyboard.press("Enter");
  const rows = page.getByRole("list", { name: "Putts, newest first" }).getByRole("listitem");
  await expect.poll(() => rows.count()).toBe(3);
  await expect.poll(() => rows.filter({ hasText: "saving…" }).count()).toBe(0);
  const undo = page.getByRole("button", { name: "Undo last putt" });
  await tabTo(page, undo);
  await page.keyboard.press("Enter");
  await expect.poll(() => rows.count()).toBe(2);
  // The focus stayed on Undo (not on <body>), so Holed is a few Shift+Tabs back.
  expect(await isFocused(undo)).toBe(true);
  await tabTo(page, holed, { back: true, max: 20 });
  const stored = await page.request.get(`${server.url}/api/sessions/${sessionId}/putts`);
  expect(((await stored.json()) as { items: { holed: boolean }[] }).items.map((p) => p.holed)).toEqual([true, true]);
  await screenshot(page, "keyboard-session-desktop");
}, 180_000);

// Ivo's Lag ladder waits on its top rung, needing one holed (server/db/seed-coaching.ts): Holed completes it. The
// rung's Holed button goes with the rung, so the focus must land on "Ladder completed" (it fell to <body> before), and
// Undo there reopens the ladder with the focus on the rung's own Undo.
test("a ladder rung by keyboard: open it from My ladders with Enter, hole the last putt, take it back", async () => {
  const { page } = browser;
  await page.goto(`${server.url}/ladders/mine`);
  // A ladder still to run (a completed one opens read-only, without Holed).
  const run = page
    .locator('main a[href^="/ladders/run/"]')
    .filter({ hasText: /^(Start|Continue)$/ })
    .first();
  await tabTo(page, run);
  await page.keyboard.press("Enter");
  await page.waitForURL(/\/ladders\/run\/[0-9a-f-]{36}$/);
  await expect.poll(() => focused(page)).toMatch(/^H1: /);
  const soFar = page.getByText(/^\d+ putts? so far\./);
  const count = async () => Number(/^(\d+)/.exec((await soFar.textContent()) ?? "")?.[1]);
  const start = await count();
  expect(
    await page
      .getByRole("list", { name: "Rungs" })
      .getByRole("listitem", { name: /playing now/ })
      .getAttribute("aria-label"),
  ).toBe("Rung 3: playing now");
  await tabTo(page, page.getByRole("button", { name: "Holed", exact: true }));
  await page.keyboard.press("Enter");
  await expect.poll(() => focused(page)).toBe("H1: Ladder completed");
  expect(await page.getByText(/^All 3 rungs passed in \d+ putts/).textContent()).toMatch(new RegExp(`in ${start + 1} putts`));
  const reopen = page.getByRole("button", { name: "Undo last putt (reopens the ladder)" });
  await tabTo(page, reopen);
  await page.keyboard.press("Enter");
  const ladderUndo = page.getByRole("button", { name: "Undo last putt", exact: true });
  await expect.poll(() => isFocused(ladderUndo)).toBe(true);
  await expect.poll(count).toBe(start);
  // Holed is back and a Shift+Tab or few away: the focus was never dropped on <body>.
  await tabTo(page, page.getByRole("button", { name: "Holed", exact: true }), { back: true, max: 20 });
  await screenshot(page, "keyboard-ladder-desktop");
}, 180_000);
