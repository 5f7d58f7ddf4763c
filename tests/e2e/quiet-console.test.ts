// A signed-out golfer's visit logs nothing in the browser console: no error (the "who is signed in?" probe answers
// 200, not 401), no warning, no Content-Security-Policy report (zod builds no code at run time), and robots.txt is a
// text file, not the app's HTML.
import { afterAll, beforeAll, expect, test } from "vitest";
import { PHONE, openBrowser, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

// The harness fails a test on any console error, warning, page error or CSP report (harness.ts, checkQuiet); this
// file only has to visit the pages.
test("a signed-out visit to every public page logs no console error, warning or CSP report", async () => {
  const browser = await openBrowser(PHONE);
  try {
    for (const path of ["/", "/read", "/rehearse", "/chart", "/train", "/sign-in", "/sign-up"]) {
      await browser.page.goto(`${server.url}${path}`);
      await browser.page.locator("h1").first().waitFor();
      await browser.page.waitForLoadState("networkidle");
    }
    expect(browser.unexpected()).toEqual([]);
  } finally {
    await browser.close();
  }
});

test("robots.txt is served as a text file", async () => {
  const res = await fetch(`${server.url}/robots.txt`);
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/^text\/plain/);
  const text = await res.text();
  expect(text).toMatch(/^User-agent: \*/m);
  expect(text).not.toMatch(/<html/i);
});
