// Readable on a sunny green: on a 390 px phone, text drawn in the read page's pictures is at least 12 px as rendered
// (an SVG scales its own text with its width), and body text and hints are 16 px.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, openBrowser, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/** SVG text rendered under 12 px, and paragraphs under 16 px, as "size text" lines. */
async function smallText(page: Page): Promise<{ drawings: string[]; paragraphs: string[] }> {
  return page.evaluate(() => {
    const drawings: string[] = [];
    for (const t of document.querySelectorAll<SVGTextElement>("svg text")) {
      const ctm = t.getScreenCTM();
      const px = parseFloat(getComputedStyle(t).fontSize) * (ctm ? Math.hypot(ctm.a, ctm.b) : 1);
      if ((t.textContent ?? "").trim() && px < 12) drawings.push(`${px.toFixed(1)}px ${t.textContent?.trim()}`);
    }
    const paragraphs: string[] = [];
    for (const p of document.querySelectorAll<HTMLElement>("main p")) {
      const px = parseFloat(getComputedStyle(p).fontSize);
      if ((p.textContent ?? "").trim() && p.getClientRects().length > 0 && px < 16)
        paragraphs.push(`${px}px ${p.textContent?.trim().slice(0, 40)}`);
    }
    return { drawings, paragraphs };
  });
}

test("on a phone, text in drawings is at least 12 px and paragraphs and hints 16 px", async () => {
  const browser = await openBrowser(PHONE);
  try {
    for (const path of ["/read", "/rehearse"]) {
      await browser.page.goto(`${server.url}${path}`);
      await browser.page.locator("h1").first().waitFor();
      await browser.page.waitForLoadState("networkidle");
      expect(await smallText(browser.page), path).toEqual({ drawings: [], paragraphs: [] });
    }
  } finally {
    await browser.close();
  }
});
