// Debian's Chromium through playwright-core (nothing is downloaded), against a real server
// serving the built client on an ephemeral port.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { afterAll, afterEach } from "vitest";
import { serveBuiltClient } from "../../server/frontend";
import { startTestServer, type TestServer } from "../setup/server";

export const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };
export const SHOTS_DIR = path.resolve("test-results/screenshots");

export async function startAppServer(env: Record<string, string> = {}): Promise<TestServer> {
  return startTestServer({ frontend: serveBuiltClient(), env });
}

export type Browser = {
  context: BrowserContext;
  page: Page;
  /** Every console error and warning, page error and CSP report so far, in order ("console error: …"). */
  messages: string[];
  /**
   * Expects these messages in this browser (each pattern may match any number of times), e.g.
   * `browser.allow(refusedStatus(401))` where a test signs in with a wrong password on purpose.
   */
  allow: (...patterns: RegExp[]) => void;
  /** The messages no `allow` pattern and no known library warning explains. */
  unexpected: () => string[];
  close: () => Promise<void>;
};

/**
 * Known and harmless, in every test: @react-three/fiber 9.8 still makes a THREE.Clock, which three.js 0.187 reports
 * as deprecated. Nothing of ours; it goes when fiber moves to THREE.Timer.
 */
const KNOWN_LIBRARY_WARNINGS = [
  /^console warning: THREE\.Clock: This module has been deprecated/,
  // Headless Chromium draws WebGL with SwiftShader and composites in software: each screenshot (or a test's
  // toDataURL) reads the 3D green's pixels back, and SwiftShader reports that read as a "GPU stall". The test
  // machine's, not the page's: a real GPU composites without reading back.
  /^console warning: \[\.WebGL-[0-9a-fx]+\]GL Driver Message \(OpenGL, Performance, GL_CLOSE_PATH_NV, High\): GPU stall due to ReadPixels(?: \(this message will no longer repeat\))?$/,
  // Chromium fetches the manifest's icons itself after a page loads; a test that leaves the page at once cuts that
  // download off, and Chromium reports it as a download error (seen once under CI's load, 2026-12-03). The browser's
  // own, not the page's: every icon is fetched and checked in offline.test.ts.
  /^console warning: Error while trying to use the following icon from the Manifest: \S+ \(Download error or resource isn't a valid image\)$/,
];

/** Browsers of the running test file whose messages have not been checked yet. */
const watched = new Set<Browser>();

/**
 * Every browser test fails on an unexpected console error or warning, page error or Content-Security-Policy report:
 * after each test (and after the file, for browsers opened in `beforeAll`) every browser opened so far is checked,
 * closed or not. Expected ones are named with `browser.allow(...)`.
 */
function checkQuiet(): void {
  const found: string[] = [];
  for (const b of watched) {
    found.push(...b.unexpected());
    b.messages.length = 0;
  }
  if (found.length > 0) throw new Error(`Unexpected messages in the browser console:\n${found.join("\n")}`);
}
afterEach(() => {
  checkQuiet();
});
afterAll(() => {
  try {
    checkQuiet();
  } finally {
    watched.clear();
  }
});

/** A fresh profile each time; its console is watched (see `checkQuiet`). */
export async function openBrowser(viewport = DESKTOP): Promise<Browser> {
  if (!fs.existsSync(CHROMIUM)) throw new Error(`Chromium not found at ${CHROMIUM}: apt-get install -y chromium`);
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  // A CSP refusal is reported to the page only; put it in the console so it is watched like the rest.
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => console.error(`CSP: ${e.violatedDirective} ${e.blockedURI}`));
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const messages: string[] = [];
  const allowed: RegExp[] = [...KNOWN_LIBRARY_WARNINGS];
  const watch = (p: Page) => {
    p.on("pageerror", (e) => messages.push(`page error: ${e.message}`));
    p.on("console", (m) => {
      if (m.type() === "error" || m.type() === "warning") messages.push(`console ${m.type()}: ${m.text()}`);
    });
  };
  watch(page);
  context.on("page", watch);
  const browser: Browser = {
    context,
    page,
    messages,
    allow: (...patterns) => {
      allowed.push(...patterns);
    },
    unexpected: () => messages.filter((m) => !allowed.some((a) => a.test(m))),
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
  watched.add(browser);
  return browser;
}

/**
 * Waits until the app runs in the page. A page drawn at build time ("/" and "/read" for a visitor without a session)
 * shows its buttons before its scripts arrive, and a key then does nothing; the drawing marks its <html> data-drawn
 * and the app removes the mark once it has hydrated (src/app/app.tsx), so the mark's absence means the page is live.
 * A page not drawn at build time never has the mark: the app draws its controls itself.
 */
export async function appRunning(page: Page): Promise<void> {
  await page.waitForFunction(() => !document.documentElement.hasAttribute("data-drawn"), undefined, { timeout: 60_000 });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(SHOTS_DIR, { recursive: true });
  const file = path.join(SHOTS_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Chromium's console line for a refused request with one of these statuses, which a test expects (a wrong password's
 * 401, a putt that cannot stop's 422): `browser.allow(refusedStatus(401, 422))`.
 */
export function refusedStatus(...statuses: number[]): RegExp {
  return new RegExp(`^console error: Failed to load resource: the server responded with a status of (${statuses.join("|")})\\b`);
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
