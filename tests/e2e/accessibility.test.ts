// axe-core (through @axe-core/playwright) on every page of the product, signed out (phone and desk size) and as a
// player (phone), a coach and an admin (desk) of the seeded demo, in the states that matter (a solved read, a session with
// putts, charts with data, a ladder being run): no violation of any impact. Contrast axe cannot decide (text drawn
// in SVG charts) is checked on the palette itself (src/lib/chart-palette.test.ts).
import { AxeBuilder } from "@axe-core/playwright";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { DEMO_ADMIN, DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import type { TestServer } from "../setup/server";
import { DESKTOP, PHONE, openBrowser, type Browser, startAppServer, signInWithForm } from "./harness";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
});
afterAll(async () => {
  await server?.stop();
});

/** A page's pathname, or the first link on the current page whose href matches (a page with an id in its path). */
type Visit = string | { from: string; link: RegExp };

const SIGNED_OUT: Visit[] = [
  "/",
  "/read",
  "/rehearse",
  "/chart",
  "/train",
  "/sign-in",
  "/sign-up",
  "/forgot-password",
  "/reset-password?token=x",
];
const PLAYER: Visit[] = [
  "/",
  "/practice",
  { from: "/practice", link: /^\/practice\/[0-9a-f-]{36}$/ },
  "/practice/import",
  "/greens",
  "/rounds",
  { from: "/rounds", link: /^\/rounds\/[0-9a-f-]{36}$/ },
  "/stats",
  "/practice/plan",
  "/ladders/mine",
  { from: "/ladders/mine", link: /^\/ladders\/run\/[0-9a-f-]{36}$/ },
  "/train",
  "/account",
];
const COACH: Visit[] = [
  "/coach",
  { from: "/coach", link: /^\/coach\/players\/[^/]+$/ },
  "/squads",
  { from: "/squads", link: /^\/squads\/[0-9a-f-]{36}$/ },
  "/ladders",
  { from: "/ladders", link: /^\/ladders\/[0-9a-f-]{36}$/ },
  "/ladders/new",
  "/greens",
  { from: "/greens", link: /^\/greens\/[0-9a-f-]{36}$/ },
  { from: "/greens", link: /^\/greens\/[0-9a-f-]{36}$/, then: /\/map$/ } as Visit,
];
const ADMIN: Visit[] = ["/admin", "/admin/coaching", "/admin/audit", "/dev/mailbox"];

async function settle(page: Page) {
  await page.locator("main h1").first().waitFor();
  await page.waitForLoadState("networkidle");
  // Spinners gone: the page's data has arrived.
  await page
    .locator('[role="status"][aria-busy="true"]')
    .first()
    .waitFor({ state: "detached", timeout: 10_000 })
    .catch(() => undefined);
}

async function firstLink(page: Page, pattern: RegExp): Promise<string | undefined> {
  const hrefs = await page.locator("main a[href]").evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? ""));
  return hrefs.find((h) => pattern.test(h.split("?")[0]!));
}

/** A round with holes (the demo has none): logged through the API in the signed-in page, as the rounds page would. */
async function logRound(page: Page) {
  const res = await page.evaluate(async () => {
    const r = await fetch("/api/rounds", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        date: "2026-11-28",
        course: "Larkspur Heath",
        holes: [
          { holeNumber: 1, firstPuttM: 4, putts: 2, leftAfterFirstM: 0.6 },
          { holeNumber: 2, firstPuttM: 1.5, putts: 1 },
        ],
      }),
    });
    return r.status;
  });
  if (res !== 201) throw new Error(`logging a round answered ${res}`);
}

async function violations(b: Browser, visits: Visit[], unreached: string[]): Promise<string[]> {
  const found: string[] = [];
  for (const visit of visits) {
    let path: string | undefined;
    if (typeof visit === "string") path = visit;
    else {
      await b.page.goto(`${server.url}${visit.from}`);
      await settle(b.page);
      path = await firstLink(b.page, visit.link);
      const then = (visit as { then?: RegExp }).then;
      if (path && then) {
        await b.page.goto(`${server.url}${path}`);
        await settle(b.page);
        path = await firstLink(b.page, then);
      }
      if (!path) {
        unreached.push(`${visit.from} → ${String(visit.link)}`);
        continue;
      }
    }
    await b.page.goto(`${server.url}${path}`);
    await settle(b.page);
    const result = await new AxeBuilder({ page: b.page as never }).analyze();
    for (const v of result.violations) found.push(`${path}: ${v.id} (${v.impact}) × ${v.nodes.length}: ${v.nodes[0]?.target.join(" ")}`);
  }
  return found;
}

/**
 * Who uses which size: signed-out pages at both; the player's pages on a phone (on the green) and the coach's and
 * admin's on a desk, where their work is done (checking every page at both sizes doubled the browser tests' time).
 * The phone-size walk of the coach's and admin's main actions is in desk.test.ts.
 */
const RUNS: { size: string; viewport: typeof PHONE; people: [string, Visit[]][] }[] = [
  { size: "phone", viewport: PHONE, people: [[DEMO_PLAYERS[1]!.email, PLAYER]] },
  {
    size: "desk",
    viewport: DESKTOP,
    people: [
      [DEMO_COACH.email, COACH],
      [DEMO_ADMIN.email, ADMIN],
    ],
  },
];

// The two sizes walk at once, each in its own browsers (most of a walk is waiting for pages to settle).
for (const { size, viewport, people } of RUNS) {
  test.concurrent(
    `axe: no violations at ${size} size, signed out and as ${size === "phone" ? "a player" : "a coach and an admin"}`,
    async () => {
      const found: string[] = [];
      // Pages reached through a link that the demo did not offer (listed, so a lost page shows).
      const unreached: string[] = [];
      const signedOut = await openBrowser(viewport);
      try {
        found.push(...(await violations(signedOut, SIGNED_OUT, unreached)));
      } finally {
        await signedOut.close();
      }
      for (const [email, visits] of people) {
        const b = await openBrowser(viewport);
        try {
          await signInWithForm(b.page, server.url, email, DEMO_PASSWORD);
          if (visits === PLAYER) await logRound(b.page);
          found.push(...(await violations(b, visits, unreached)).map((v) => `${email} ${v}`));
        } finally {
          await b.close();
        }
      }
      expect(found).toEqual([]);
      // Every page with an id in its path was reached through the demo (a missing link would hide a page from axe).
      expect(unreached).toEqual([]);
    },
    600_000,
  );
}
