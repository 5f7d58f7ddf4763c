import { afterAll, beforeAll, expect, test } from "vitest";
import { DESKTOP, PHONE, appRunning, openBrowser, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

test("a new user signs up, lands in the app, stays signed in across a reload and signs out", async () => {
  const browser = await openBrowser(DESKTOP);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/sign-up`);
    await page.getByLabel("Name").fill("Nora Fairway");
    await page.getByLabel("E-mail").fill("nora@example.test");
    await page.getByLabel("Password").fill("a-good-long-password");
    await page.getByText("I am a player").click();
    await page.getByRole("button", { name: /create/i }).click();

    await page.getByText("Signed in as").first().waitFor();
    await page.waitForURL((url) => url.pathname === "/");
    await expect(page.getByText("(player)").first().isVisible()).resolves.toBe(true);
    await screenshot(page, "auth-signed-in-desktop");

    await page.reload();
    await page.getByText("Signed in as").first().waitFor();
    await expect(page.getByRole("link", { name: "Nora Fairway" }).first().isVisible()).resolves.toBe(true);

    await page.getByRole("button", { name: "Sign out" }).first().click();
    await page.getByRole("link", { name: "Sign in" }).first().waitFor();
    await page.reload();
    await page.getByRole("link", { name: "Sign in" }).first().waitFor();
    expect(await page.getByText("Signed in as").count()).toBe(0);
  } finally {
    await browser.close();
  }
});

test("on a phone the menu opens with the keyboard and shows the account", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/`);
    // The home page comes drawn; its menu answers once the app runs.
    await appRunning(page);
    const menu = page.getByRole("button", { name: /menu/i });
    await menu.focus();
    await page.keyboard.press("Enter");
    await page.getByRole("link", { name: "Create account" }).last().waitFor({ state: "visible" });
    await screenshot(page, "home-phone-menu");
    await page.keyboard.press("Escape");
  } finally {
    await browser.close();
  }
});

/** Expected refusals (Chromium logs each as a failed resource); any other console error fails the test. */
