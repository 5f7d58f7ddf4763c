// The app opens with no signal (issue 14): after one visit signed in, the service worker serves the app, a read is
// worked out in the browser, putts and ladder putts are kept on the phone, and each reaches the server once when
// the connection returns. And a newly deployed version waits for the golfer's "Reload".
import { afterAll, beforeAll, expect, test } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { IncomingMessage } from "node:http";
import type { BrowserContext, Page } from "playwright-core";
import { coachWithSquad, createLadder } from "../factories/coaching";
import { TEST_PASSWORD } from "../factories/users";
import type { TestServer } from "../setup/server";
import { PHONE, openBrowser, screenshot, startAppServer, signInWithApi } from "./harness";
import { serveBuiltClient } from "../../server/frontend";
import { startTestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/**
 * No signal, as a phone has none: the browser is offline (the page's own requests fail, `navigator.onLine` is false)
 * and the server drops whatever still reaches it from the browser. Chromium's offline mode is not airtight: it does not
 * cover the service worker's own fetches, and a page being navigated away from hears an `online` event after its
 * `beforeunload` (seen in this test's runs, 2026-12-03), so the queue it holds may try once more on its way out, and
 * that request leaves the browser. No phone without signal does either; the server drops those requests as the
 * missing signal would, and the test checks what the golfer relies on: nothing is stored while offline, and
 * everything is stored once when the signal returns.
 */
function signal(context: BrowserContext, target: TestServer) {
  let offline = false;
  const drop = (req: IncomingMessage) => {
    // Only the browser is offline: the test's own client still looks at the server.
    if (!offline || !/Mozilla/.test(req.headers["user-agent"] ?? "")) return;
    req.socket.destroy();
  };
  target.server.prependListener("request", drop);
  return {
    off: async () => {
      offline = true;
      await context.setOffline(true);
    },
    on: async () => {
      offline = false;
      await context.setOffline(false);
    },
  };
}

/** The service worker controls the page: the app shell is precached and API answers are kept from now on. */
async function controlled(page: Page) {
  await page.waitForFunction(
    () => navigator.serviceWorker?.controller !== null && navigator.serviceWorker?.controller !== undefined,
    undefined,
    { timeout: 60_000 },
  );
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
}

/** Waits (without a timing assertion) until the server has what we expect, or gives up after `tries` looks. */
async function eventually<T>(look: () => Promise<T>, done: (v: T) => boolean, tries = 120): Promise<T> {
  let value = await look();
  for (let i = 0; i < tries && !done(value); i++) {
    await new Promise((r) => setTimeout(r, 500));
    value = await look();
  }
  return value;
}

test("after one visit the app opens offline: a read is worked out, three putts and two ladder putts are kept and sent once each", async () => {
  const { coach, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const ladder = await createLadder(coach.client);
  const assigned = await coach.client.post(`/api/ladders/${ladder}/assignments`, { playerIds: [player.id] });
  expect(assigned.status).toBe(201);
  const assignmentId = assigned.body.assignments[0].id as string;
  const session = await player.client.post("/api/sessions", { date: new Date().toISOString().slice(0, 10) });
  expect(session.status).toBe(201);
  const sessionId = session.body.id as string;

  const browser = await openBrowser(PHONE);
  // With the signal cut, every request the page still tries fails, and Chromium logs each one.
  browser.allow(/^console error: Failed to load resource: net::ERR_INTERNET_DISCONNECTED$/);
  // And a request that leaves the browser anyway (see signal) finds its connection dropped by the server.
  browser.allow(/^console error: Failed to load resource: net::ERR_EMPTY_RESPONSE$/);
  const { page, context } = browser;
  const net = signal(context, server);
  try {
    // The first visit, signed in: the worker installs and takes over; the golfer opens the screens they will use.
    await signInWithApi(page, server.url, player.email, TEST_PASSWORD);
    await controlled(page);
    await page.goto(`${server.url}/practice/${sessionId}`);
    await page.getByRole("button", { name: "Holed", exact: true }).waitFor();
    await page.goto(`${server.url}/ladders/run/${assignmentId}`);
    await page.getByRole("button", { name: "Holed", exact: true }).waitFor();
    await page.goto(`${server.url}/read`);
    await page.getByTestId("aim-headline").waitFor();

    // No signal. A reload opens the app (not the browser's offline page) and a new read is worked out here.
    await net.off();
    await page.reload();
    await page.getByTestId("aim-headline").waitFor();
    await page.getByLabel("Distance (ft)").fill("20");
    await page.locator("label", { hasText: /^Uphill, falls left$/ }).click();
    await page.getByText("Breaks right to left", { exact: true }).waitFor();
    expect(await page.getByTestId("aim-headline").textContent()).toMatch(/outside the right edge/);
    await screenshot(page, "offline-read-phone");

    // Three putts on the session, logged offline: kept on the phone.
    await page.goto(`${server.url}/practice/${sessionId}`);
    const holed = page.getByRole("button", { name: "Holed", exact: true });
    await holed.click();
    await holed.click();
    await page.getByRole("button", { name: "Left", exact: true }).click();
    await page.getByRole("button", { name: /^Missed/ }).click();
    const list = page.getByRole("list", { name: "Putts, newest first" });
    await expect(list.getByRole("listitem").count()).resolves.toBe(3);
    // Not stored yet: each is marked as waiting (or still being tried).
    await expect(list.getByText(/waiting to be saved|saving…/).count()).resolves.toBe(3);
    await screenshot(page, "offline-logging-phone");

    // Two ladder putts, offline too; the page is reloaded with them still waiting (they live in localStorage).
    await page.goto(`${server.url}/ladders/run/${assignmentId}`);
    const ladderHoled = page.getByRole("button", { name: "Holed", exact: true });
    await ladderHoled.click();
    await ladderHoled.click();
    await page.reload();
    await ladderHoled.waitFor();
    // The server has none of them yet (the harness drops the browser's requests while offline; this checks it did).
    expect((await player.client.get(`/api/sessions/${sessionId}/putts`)).body.items).toEqual([]);
    expect((await player.client.get(`/api/assignments/${assignmentId}`)).body.putts).toEqual([]);

    // The signal returns on the ladder page: both queues are sent.
    await net.on();
    const putts = await eventually(
      async () => (await player.client.get(`/api/sessions/${sessionId}/putts`)).body.items as { clientId: string; holed: boolean }[],
      (items) => items.length >= 3,
    );
    const ladderPutts = await eventually(
      async () => (await player.client.get(`/api/assignments/${assignmentId}`)).body.putts as unknown[],
      (items) => items.length >= 2,
    );
    // Once each, even after another reload (which resumes anything still kept).
    await page.reload();
    await ladderHoled.waitFor();
    await page.goto(`${server.url}/practice/${sessionId}`);
    await list.getByRole("listitem").nth(2).waitFor();
    await page.waitForLoadState("networkidle");
    await expect(list.getByRole("listitem").count()).resolves.toBe(3);
    await expect(list.getByText(/waiting to be saved|saving…/).count()).resolves.toBe(0);
    const after = (await player.client.get(`/api/sessions/${sessionId}/putts`)).body.items as { clientId: string; holed: boolean }[];
    expect(after).toHaveLength(3);
    expect(new Set(after.map((p) => p.clientId)).size).toBe(3);
    expect(after.map((p) => p.holed).sort()).toEqual([false, true, true]);
    expect(putts).toHaveLength(3);
    expect(ladderPutts).toHaveLength(2);
    expect((await player.client.get(`/api/assignments/${assignmentId}`)).body.putts).toHaveLength(2);
  } finally {
    await net.on();
    await browser.close();
  }
});

test("the manifest names Borrowline with its own icons, and the worker keeps no API answer but the logging screens'", async () => {
  // The Content-Security-Policy lets the worker run (the first test proves it registers under it).
  const page = await fetch(`${server.url}/read`);
  expect(page.headers.get("content-security-policy")).toMatch(/worker-src 'self'/);
  const manifest = await (await fetch(`${server.url}/manifest.webmanifest`)).json();
  expect(manifest).toMatchObject({ name: "Borrowline", short_name: "Borrowline", start_url: "/", display: "standalone" });
  const sizes = (manifest.icons as { sizes: string; type: string }[]).map((i) => `${i.sizes} ${i.type}`);
  expect(sizes).toEqual(expect.arrayContaining(["192x192 image/png", "512x512 image/png"]));
  for (const icon of manifest.icons as { src: string; type: string }[]) {
    const res = await fetch(`${server.url}${icon.src}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain(icon.type);
    expect((await res.arrayBuffer()).byteLength).toBeGreaterThan(100);
  }
  const sw = await (await fetch(`${server.url}/sw.js`)).text();
  // API answers are cached only by the one network-first route for the logging screens (src/lib/offline-cache.ts).
  expect(sw.match(/cacheName:"[^"]+"/g)).toEqual(['cacheName:"borrowline-api"']);
  expect(sw).not.toMatch(/reads\\?\/solve|\/api\/stats|\/api\/auth/);
});

test("a new version waits for the golfer: 'A new version is ready' with Reload, which brings it in", async () => {
  // A copy of the build that can be changed, as a deploy would.
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), "borrowline-dist-"));
  fs.cpSync(path.resolve("dist"), dist, { recursive: true });
  const own = await startTestServer({ frontend: serveBuiltClient(dist) });
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${own.url}/read`);
    await controlled(page);
    await page.getByTestId("aim-headline").waitFor();
    expect(await page.getByText("A new version is ready").count()).toBe(0);

    // Deploy: a changed worker (as a new build's precache list changes it).
    for (const copy of ["sw.js.br", "sw.js.gz"]) fs.rmSync(path.join(dist, copy), { force: true });
    fs.appendFileSync(path.join(dist, "sw.js"), "\n// the next version\n");
    await page.evaluate(async () => {
      const reg = await navigator.serviceWorker.getRegistration();
      await reg?.update();
    });
    const prompt = page.getByRole("status").filter({ hasText: "A new version is ready" });
    await prompt.waitFor({ timeout: 60_000 });
    await screenshot(page, "update-prompt-phone");
    const reloaded = page.waitForEvent("load", { timeout: 60_000 });
    await prompt.getByRole("button", { name: "Reload" }).click();
    await reloaded;
    await page.getByTestId("aim-headline").waitFor();
    expect(await page.getByText("A new version is ready").count()).toBe(0);
    const version = await page.evaluate(async () => {
      const reg = await navigator.serviceWorker.getRegistration();
      const url = reg?.active?.scriptURL;
      return url ? await (await fetch(url)).text() : "";
    });
    expect(version).toContain("the next version");
  } finally {
    await browser.close();
    await own.stop();
    fs.rmSync(dist, { recursive: true, force: true });
  }
});
