// Debian's Chromium through playwright-core (nothing is downloaded), against a real server
// serving the built client on an ephemeral port.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { serveBuiltClient } from "../../server/frontend";
import { startTestServer, type TestServer } from "../setup/server";

export const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };
export const SHOTS_DIR = path.resolve("test-results/screenshots");

export async function startAppServer(env: Record<string, string> = {}): Promise<TestServer> {
  return startTestServer({ frontend: serveBuiltClient(), env });
}

export type Browser = { context: BrowserContext; page: Page; errors: string[]; close: () => Promise<void> };

/** A fresh profile each time; console errors and page errors are collected so a test can fail on them. */
export async function openBrowser(viewport = DESKTOP): Promise<Browser> {
  if (!fs.existsSync(CHROMIUM)) throw new Error(`Chromium not found at ${CHROMIUM}: apt-get install -y chromium`);
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  const watch = (p: Page) => {
    p.on("pageerror", (e) => errors.push(`pageerror: ${e.message}`));
    p.on("console", (m) => {
      if (m.type() === "error") errors.push(`console: ${m.text()}`);
    });
  };
  watch(page);
  context.on("page", watch);
  return {
    context,
    page,
    errors,
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(SHOTS_DIR, { recursive: true });
  const file = path.join(SHOTS_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * A filter for `browser.errors`: drops Chromium's "Failed to load resource" line for the given statuses, which a
 * test expects (a wrong password's 401, a putt that cannot stop's 422); every other error stays.
 */
export function allowingStatus(...statuses: number[]): (message: string) => boolean {
  const expected = new RegExp(`Failed to load resource: the server responded with a status of (${statuses.join("|")})\\b`);
  return (message) => !expected.test(message);
}

/** Signs the page in through the API (the session cookie lands in the browser), for tests about other things. */
export async function signInWithApi(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/`);
  await page.evaluate(
    async ([e, p]) => {
      const res = await fetch("/api/auth/sign-in/email", {
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: JSON.stringify({ email: e, password: p }),
      });
      if (!res.ok) throw new Error(`sign-in ${res.status}`);
    },
    [email, password] as const,
  );
}

/** Signs the page in through the sign-in form, as a golfer would, and waits for the account line. */
export async function signInWithForm(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  // On a phone the account menu is folded away: the text is there, not visible.
  await page.getByText("Signed in as").first().waitFor({ state: "attached" });
}
