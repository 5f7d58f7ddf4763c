// A page on another port of the same host (the same "site", so SameSite=Lax cookies go along) tries to write
// into a signed-in player's account with a form post and with fetch, as JSON-looking text and as a multipart
// CSV upload. Every attempt is refused and nothing is stored.
import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, expect, test } from "vitest";
import { DESKTOP, openBrowser, refusedStatus, startAppServer, type Browser } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
let browser: Browser;
let attacker: http.Server;
let attackerUrl = "";

const CSV = "Date,Distance (m),Made\n2026-03-01,2,yes\n2026-03-01,4,no\n";
const MAPPING = JSON.stringify({ date: "Date", distance: "Distance (m)", distanceUnit: "m", holed: "Made" });

function attackPage(app: string): string {
  return `<!doctype html><meta charset="utf-8"><title>Win a putter</title>
<form id="json" method="POST" action="${app}/api/sessions" enctype="text/plain"><input name='{"date":"2026-05-01","notes":"forged","x":"' value='"}'></form>
<form id="csv" method="POST" action="${app}/api/csv/putts/import" enctype="multipart/form-data">
  <input type="file" name="file"><input type="hidden" name="mapping" value='${MAPPING}'>
</form>
<script>
  window.attackWithFetch = async () => {
    const results = [];
    const form = new FormData();
    form.append("file", new Blob([${JSON.stringify(CSV)}], { type: "text/csv" }), "putts.csv");
    form.append("mapping", ${JSON.stringify(MAPPING)});
    for (const init of [
      { body: form, url: "/api/csv/putts/import" },
      { body: JSON.stringify({ date: "2026-05-02", notes: "forged" }), url: "/api/sessions", headers: { "content-type": "text/plain" } },
    ]) {
      try {
        await fetch("${app}" + init.url, { method: "POST", mode: "no-cors", credentials: "include", body: init.body, headers: init.headers });
        results.push("sent");
      } catch (e) {
        results.push("failed: " + e.message);
      }
    }
    return results;
  };
  window.attackWithCsvForm = () => {
    const input = document.querySelector("#csv input[type=file]");
    const dt = new DataTransfer();
    dt.items.add(new File([${JSON.stringify(CSV)}], "putts.csv", { type: "text/csv" }));
    input.files = dt.files;
    document.getElementById("csv").submit();
  };
</script>`;
}

beforeAll(async () => {
  server = await startAppServer();
  attacker = http.createServer((_req, res) => {
    res.writeHead(200, { "content-type": "text/html" });
    res.end(attackPage(server.url));
  });
  await new Promise<void>((resolve) => attacker.listen(0, "127.0.0.1", () => resolve()));
  attackerUrl = `http://127.0.0.1:${(attacker.address() as AddressInfo).port}`;
  browser = await openBrowser(DESKTOP);
  // The refusals this test is about: Chromium logs the blocked cross-origin answers and the server's 403s.
  browser.allow(/^console error: Failed to load resource: net::ERR_BLOCKED_BY_RESPONSE\.NotSameOrigin$/, refusedStatus(403));
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await new Promise<void>((resolve) => (attacker ? attacker.close(() => resolve()) : resolve()));
  await server?.stop();
});

// The app's own origin, for the page's same-origin fetches: its health answer rather than the app itself, so that
// leaving it at once does not cut off anything the app's page starts loading (its manifest's icons).
const sameOrigin = () => `${server.url}/api/health`;

async function stored(page: Browser["page"]) {
  await page.goto(sameOrigin());
  return page.evaluate(async () => {
    const [s, p] = await Promise.all([fetch("/api/sessions").then((r) => r.json()), fetch("/api/putts").then((r) => r.json())]);
    return { sessions: s.total as number, putts: p.total as number };
  });
}

test("a page served from another port posts a form and a fetch into a signed-in account: refused, nothing stored", async () => {
  const page = browser.page;
  await page.goto(sameOrigin());
  const signedUp = await page.evaluate(async () => {
    const res = await fetch("/api/auth/sign-up/email", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        name: "Target Golfer",
        email: "target@example.test",
        password: "target-password-long",
        accountType: "player",
      }),
    });
    return res.status;
  });
  expect(signedUp).toBe(200);
  expect(await stored(page)).toEqual({ sessions: 0, putts: 0 });

  // The other site: fetch (no-cors, credentials included), then the two forms, each a top-level POST.
  await page.goto(attackerUrl);
  // The answers are opaque to the page, and helmet's Cross-Origin-Resource-Policy makes Chromium drop them
  // (ERR_BLOCKED_BY_RESPONSE): the requests did reach the server, with the player's cookie, and were answered.
  const answered: Record<string, string> = {};
  const failed = (r: { url: () => string; failure: () => { errorText: string } | null }) => {
    if (r.url().startsWith(server.url)) answered[new URL(r.url()).pathname] = r.failure()?.errorText ?? "";
  };
  page.on("requestfailed", failed);
  await page.evaluate(() => (window as unknown as { attackWithFetch: () => Promise<string[]> }).attackWithFetch());
  await expect.poll(() => Object.keys(answered).length).toBe(2);
  page.off("requestfailed", failed);
  expect(answered).toEqual({
    "/api/csv/putts/import": expect.stringContaining("ERR_BLOCKED_BY_RESPONSE"),
    "/api/sessions": expect.stringContaining("ERR_BLOCKED_BY_RESPONSE"),
  });
  const csvAnswer = page.waitForResponse((r) => r.url().endsWith("/api/csv/putts/import"));
  await page.evaluate(() => (window as unknown as { attackWithCsvForm: () => void }).attackWithCsvForm());
  expect((await csvAnswer).status()).toBe(403);
  await page.waitForURL("**/api/csv/putts/import");
  await page.goto(attackerUrl);
  const jsonAnswer = page.waitForResponse((r) => r.url().endsWith("/api/sessions"));
  await page.evaluate(() => (document.getElementById("json") as HTMLFormElement).submit());
  expect([403, 415]).toContain((await jsonAnswer).status());
  await page.waitForURL("**/api/sessions");

  expect(await stored(page)).toEqual({ sessions: 0, putts: 0 });
}, 120_000);
