// The practice plan in Chromium, on the demo data: a junior on a phone finds a plan built from their log and starts
// it, which opens a ladder they can run at once; the coach, at a desk, sees it on the junior's page and adopts it
// into the ladder library. Keyboard only for the player's start.
import { afterAll, beforeAll, expect, test } from "vitest";
import { DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import type { TestServer } from "../setup/server";
import { DESKTOP, PHONE, openBrowser, screenshot, signInWithApi, startAppServer, type Browser } from "./harness";

let server: TestServer;
let phone: Browser;
let desk: Browser;
const JUNIOR = DEMO_PLAYERS[0];

beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
  phone = await openBrowser(PHONE);
  desk = await openBrowser(DESKTOP);
});
afterAll(async () => {
  await phone?.close();
  await desk?.close();
  await server?.stop();
});

test("a demo junior's plan appears on a phone and, started from the keyboard, becomes a ladder they can run", async () => {
  const p = phone.page;
  await signInWithApi(p, server.url, JUNIOR.email, DEMO_PASSWORD);
  await p.goto(`${server.url}/practice/plan`);
  await p.getByRole("heading", { level: 1, name: "Practice plan" }).waitFor();
  await p.getByRole("heading", { level: 2, name: "The proposed plan" }).waitFor();
  // Built from the log: the lengths that cost strokes, a ladder, a weekly volume and a training level.
  await p.getByRole("heading", { name: "Where your strokes go" }).waitFor();
  const rungs = p.getByRole("list", { name: "Rungs of the plan's ladder" }).getByRole("listitem");
  expect(await rungs.count()).toBeGreaterThanOrEqual(3);
  await expect(
    p
      .getByText(/sessions/)
      .first()
      .isVisible(),
  ).resolves.toBe(true);
  await expect(p.getByRole("link", { name: /level$/ }).isVisible()).resolves.toBe(true);
  // Nothing wider than the phone (the bands table scrolls inside its own region).
  expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await p.getByText("Every length, against the tour").click();
  await p.getByRole("region", { name: "Make rate by length against the tour" }).waitFor();
  await screenshot(p, "practice-plan-phone");

  // Keyboard: focus the start button and press Enter.
  const start = p.getByRole("button", { name: "Start this plan now" });
  await start.focus();
  await p.keyboard.press("Enter");
  await p.waitForURL(/\/ladders\/run\/[0-9a-f-]{36}$/);
  await p
    .getByText(/Rung 1 of \d/)
    .first()
    .waitFor();
  await screenshot(p, "practice-plan-run-phone");

  // Back on the plan page: the plan under way, with its weekly check.
  await p.goto(`${server.url}/practice/plan`);
  await p.getByRole("heading", { level: 2, name: "The plan under way" }).waitFor();
  await p.getByRole("region", { name: "Weekly check of the plan" }).waitFor();
  await expect(p.getByRole("link", { name: "Run the plan’s ladder" }).isVisible()).resolves.toBe(true);
  await screenshot(p, "practice-plan-under-way-phone");
  expect(phone.unexpected()).toEqual([]);
});

test("the coach sees the junior's plan on the player's page and adopts it into the ladder library", async () => {
  const c = desk.page;
  await signInWithApi(c, server.url, DEMO_COACH.email, DEMO_PASSWORD);
  await c.goto(`${server.url}/coach`);
  await c.getByRole("link", { name: JUNIOR.name }).filter({ visible: true }).first().click();
  await c.getByRole("heading", { level: 1, name: JUNIOR.name }).waitFor();
  await c.getByRole("heading", { level: 3, name: "Practice plan" }).waitFor();
  // The junior started it (the first test): the coach sees it under way too.
  await c.getByRole("heading", { level: 4, name: "The plan under way" }).waitFor();
  await c.getByRole("heading", { level: 4, name: "What the log proposes now" }).waitFor();
  await screenshot(c, "practice-plan-coach-desktop");
  await c.getByRole("button", { name: `Adopt this plan for ${JUNIOR.name}` }).click();
  await c.waitForURL(/\/ladders\/[0-9a-f-]{36}$/);
  await c.getByRole("heading", { level: 1, name: new RegExp(`^${JUNIOR.name}: `) }).waitFor();
  // The coach's own flows take it from here: edit and assign.
  await expect(c.getByRole("link", { name: /Edit/ }).first().isVisible()).resolves.toBe(true);
  await screenshot(c, "practice-plan-adopted-desktop");
  expect(desk.unexpected()).toEqual([]);
});
