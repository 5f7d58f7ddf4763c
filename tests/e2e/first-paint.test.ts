// The first pages a visitor lands on ("/" and "/read") come drawn from the build (scripts/prerender.ts), so their text
// paints when the HTML and CSS arrive; the browser then hydrates them (src/main.tsx). A hydration that does not match
// is a page error in production React, which the harness's console check fails on (harness.ts, checkQuiet).
import fs from "node:fs";
import path from "node:path";
import type { Route } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { ICONS, renderIcon } from "../../scripts/render-icons";
import { DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import { PHONE, appRunning, openBrowser, screenshot, signInWithForm, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
});
afterAll(async () => {
  await server?.stop();
});

/** The text inside #root of the HTML the server sends (tags stripped), "" when #root is empty. */
async function drawnText(
  path: string,
  headers: Record<string, string> = {},
): Promise<{ text: string; title: string | undefined; vary: string | null }> {
  const res = await fetch(`${server.url}${path}`, { headers });
  expect(res.status).toBe(200);
  const html = await res.text();
  const root = html.slice(html.indexOf('<div id="root">'), html.indexOf("<noscript>"));
  const head = html.slice(0, html.indexOf("</head>"));
  return {
    text: root
      .replace(/<[^>]+>/g, " ")
      .replace(/\s+/g, " ")
      .trim(),
    title: /<title>([^<]*)<\/title>/.exec(head)?.[1],
    vary: res.headers.get("vary"),
  };
}

test("a visitor without a session gets / and /read already drawn, with their headings, and nobody else does", async () => {
  const home = await drawnText("/");
  expect(home.text).toMatch(/Know where to start the ball, and how firmly to roll it\./);
  expect(home.text).toMatch(/Sign in/);
  const read = await drawnText("/read");
  expect(read.text).toMatch(/Where to start it, and how firmly/);
  expect(read.text).toMatch(/Distance \(ft\)/);
  expect(read.text).toMatch(/Copy link to this read/);
  // The tab is named for the page before any script runs, and the page's title is not left in the body.
  expect(read.title).toBe("Read a putt · Borrowline");
  expect(home.title).toMatch(/^Borrowline — /);
  expect(read.text).not.toContain("Read a putt · Borrowline");
  expect(read.vary).toMatch(/Cookie/i);

  // Someone with a session sees their own page, drawn by the browser: the drawing is of a signed-out visit.
  expect((await drawnText("/read", { Cookie: "better-auth.session_token=abc.def" })).text).toBe("");
  expect((await drawnText("/", { Cookie: "theme=x; __Secure-better-auth.session_token=abc.def" })).text).toBe("");
  // A shared read's link carries its own values: drawn by the browser, never the drawing of the defaults.
  expect((await drawnText("/read?d=6.096&s=2&f=225&st=10")).text).toBe("");
  // Pages not drawn at build time stay the empty shell.
  expect((await drawnText("/chart")).text).toBe("");

  // A drawn page preloads only what every page's entry needs: its route's chunks wait for the app to start, so that
  // on a slow link they do not share it with the CSS and fonts that paint the page (Lighthouse: /read LCP 2.8 → 2.2 s).
  const preloads = async (path: string) =>
    [...(await (await fetch(`${server.url}${path}`)).text()).matchAll(/<link rel="modulepreload"[^>]*href="([^"]+)"/g)]
      .map((m) => m[1])
      .sort();
  const shell = await preloads("/chart");
  expect(shell.length).toBeGreaterThan(0);
  expect(await preloads("/read")).toEqual(shell);
  expect(await preloads("/")).toEqual(shell);
});

test("before any script has run, the drawn /read already shows its heading, form, the read's answer and footer", async () => {
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    // No script ever arrives: what shows is what the HTML and CSS alone paint.
    await page.route("**/*.js", (route) => route.abort());
    phone.allow(/^console error: Failed to load resource: net::ERR_FAILED$/);
    await page.goto(`${server.url}/read`);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Where to start it, and how firmly");
    await expect.poll(() => page.getByLabel("Distance (ft)").inputValue()).toBe("10");
    // The default putt's answer is in the drawing: aim and pace show before any script (10 ft, 2 %, falls right).
    expect(await page.getByTestId("aim-headline").textContent()).toMatch(/^Start it \d+ in outside the left edge$/);
    expect(await page.getByText(/Grain, wind and contours are yours to judge/).isVisible()).toBe(true);
    await screenshot(page, "first-paint-read-before-scripts");
  } finally {
    await phone.close();
  }
});

test("the drawn /read's form and answer are parts hydrated after the page around them, written whole and in place", async () => {
  // Each is a finished Suspense boundary (src/lib/drawn-part.tsx): React hydrates the page first and the parts in a
  // pass of their own, so hydration ends in shorter tasks. Finished and in place: no inline script moves them (CSP).
  const html = await (await fetch(`${server.url}/read`)).text();
  const root = html.slice(html.indexOf('<div id="root">'), html.indexOf("<noscript>"));
  const parts = root.split("<!--$-->").slice(1);
  expect(parts).toHaveLength(2);
  expect(parts[0]).toContain("Distance (ft)");
  expect(parts[1]).toContain("Copy link to this read");
  expect(root).not.toMatch(/<template|<!--\$[?!]-->|<script(?![^>]*type="application\/json")/);
});

test("until its scripts have run, the drawn /read's controls take no tap and soon look it; then they work", async () => {
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    // The scripts are held back, as on a slow link, until the test lets them through.
    const held: Route[] = [];
    let release = false;
    await page.route("**/*.js", (route) => (release ? route.continue() : void held.push(route)));
    // Animation events inside #root reach React's listener there as the page hydrates: the dimming sends none.
    await page.addInitScript(() => {
      const w = window as unknown as { animationEventsInRoot: number };
      w.animationEventsInRoot = 0;
      for (const type of ["animationstart", "animationend"])
        document.addEventListener(type, (e) => (e.target as Element).closest?.("#root") && w.animationEventsInRoot++, true);
    });
    await page.goto(`${server.url}/read`, { waitUntil: "commit" });
    const copy = page.getByRole("button", { name: "Copy link to this read" });
    const distance = page.getByLabel("Distance (ft)");
    await copy.waitFor();
    const look = (name: "pointerEvents" | "opacity") => copy.evaluate((el, n) => getComputedStyle(el)[n], name);
    expect(await look("pointerEvents")).toBe("none");
    // A second later they say they are not ready: dimmed. Not sooner: an app that runs within a second shows no dim
    // flash, and spares the page a full restyle as the dimming starts (issue 18).
    expect(await page.evaluate(() => getComputedStyle(document.documentElement).animationDelay)).toBe("1s");
    await expect.poll(() => look("opacity"), { timeout: 10_000 }).toBe("0.55");
    await screenshot(page, "first-paint-read-not-ready");
    expect(await page.evaluate(() => (window as unknown as { animationEventsInRoot: number }).animationEventsInRoot)).toBe(0);
    // A tap on the distance does not start typing that the app would then overwrite.
    const box = (await distance.boundingBox())!;
    await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
    expect(await distance.evaluate((el) => el === document.activeElement)).toBe(false);
    expect(held.length).toBeGreaterThan(0);

    release = true;
    for (const route of held.splice(0)) await route.continue();
    await appRunning(page);
    expect(await look("pointerEvents")).toBe("auto");
    expect(await look("opacity")).toBe("1");
    await distance.fill("12");
    await page.waitForURL(/[?&]d=3\.65/); // the link carries metres: 12 ft = 3.658 m
    await page.getByTestId("aim-headline").waitFor();
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("a drawn page starts without the app appending a preload link for each chunk its route imports", async () => {
  // Vite's preload helper appends one <link rel="modulepreload"> per chunk a lazy route imports, in the task that
  // starts the app; for the drawn pages' routes the build leaves the list empty (vite.config.ts, issue 18: /read's
  // blocking time halved in Lighthouse). The route's chunks then come as its imports, and the page still starts.
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    for (const path of ["/read", "/"]) {
      const html = await (await fetch(`${server.url}${path}`)).text();
      const inHtml = [...html.matchAll(/<link rel="modulepreload"/g)].length;
      await page.goto(`${server.url}${path}`);
      await appRunning(page);
      await page.waitForLoadState("networkidle");
      expect({ path, links: await page.locator('link[rel="modulepreload"]').count() }).toEqual({ path, links: inHtml });
    }
    // The app works: the read answers a typed putt.
    await page.goto(`${server.url}/read`);
    await appRunning(page);
    await page.getByLabel("Distance (ft)").fill("14");
    await page.waitForURL(/[?&]d=4\.26/); // 14 ft = 4.267 m
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("the answer drawn into /read is the API's answer to its read, and the running page does not ask for it again", async () => {
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    const solves: string[] = [];
    page.on("request", (r) => {
      if (r.url().endsWith("/api/reads/solve")) solves.push(r.postData() ?? "");
    });
    await page.goto(`${server.url}/read`);
    await appRunning(page);
    await page.waitForURL(/[?&]rp=0\.4318/); // the page writes its read into the address: 17 in past
    await page.waitForLoadState("networkidle");
    expect(solves).toEqual([]);

    const drawn = JSON.parse((await page.locator("#drawn-queries").textContent()) ?? "[]") as {
      queryKey: [string, string, unknown];
      data: unknown;
    }[];
    expect(drawn).toHaveLength(1);
    const [{ queryKey, data }] = drawn as [(typeof drawn)[number]];
    expect(queryKey[2]).toEqual({ distanceM: 3.048, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.4318 } });
    const api = await page.evaluate(async (read) => {
      const res = await fetch("/api/reads/solve", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(read),
      });
      return { status: res.status, body: (await res.json()) as unknown };
    }, queryKey[2]);
    expect(api.status).toBe(200);
    expect(data).toEqual(api.body);
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("the drawn /read hydrates without a mismatch, then honours a visitor's metric choice and reads a typed putt", async () => {
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    // Chosen on an earlier visit: the drawing is in feet, the page switches once it runs.
    await phone.context.addInitScript(() => window.localStorage.setItem("borrowline.units", "metric"));
    await page.goto(`${server.url}/read`);
    await page.getByLabel("Distance (m)").waitFor();
    await page.getByTestId("aim-headline").waitFor();
    await page.getByLabel("Distance (m)").fill("6");
    await page.waitForURL(/d=6&/);
    await page
      .getByRole("status")
      .filter({ hasText: "Updating" })
      .waitFor({ state: "detached" })
      .catch(() => {});
    expect(await page.getByTestId("aim-headline").textContent()).toMatch(/\d+ cm /);
    // The copy button is drawn too (whether the clipboard may be used is found out at the click).
    await page.getByRole("button", { name: "Copy link to this read" }).waitFor();
    await screenshot(page, "first-paint-read-metric");
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("from the drawn home page a golfer signs in, and the page knows them", async () => {
  const phone = await openBrowser(PHONE);
  try {
    const { page } = phone;
    await page.goto(`${server.url}/`);
    await page.getByRole("heading", { level: 1 }).waitFor();
    const ivo = DEMO_PLAYERS[0]!;
    await signInWithForm(page, server.url, ivo.email, DEMO_PASSWORD);
    await page.goto(`${server.url}/`);
    await page.getByText("Signed in as").first().waitFor({ state: "attached" });
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("a page's icons are pictures: loading a page fetches no SVG icon, which Chromium would draw as a document", async () => {
  // An SVG icon (the tab's <link rel="icon">, or the manifest's) is drawn by Chromium as a whole SVG document in the
  // page's own renderer while the page loads, and torn down after: ~30 ms of main thread each time in a trace of
  // /read on this machine, and Lighthouse counted it as blocking. The icons are PNG (public/favicon-32.png and the
  // manifest's icon-*.png, rendered from public/favicon.svg by `npm run icons`).
  const phone = await openBrowser(PHONE);
  try {
    const { page, context } = phone;
    const icons: string[] = [];
    context.on("request", (r) => {
      if (r.resourceType() === "other" && /\.(svg|png|ico)$/.test(new URL(r.url()).pathname)) icons.push(new URL(r.url()).pathname);
    });
    for (const path of ["/read", "/", "/chart"]) {
      await page.goto(`${server.url}${path}`);
      await page.waitForLoadState("networkidle");
    }
    expect(icons.length).toBeGreaterThan(0); // the browser does fetch the icons here, so their kind is tested
    expect(icons.filter((p) => p.endsWith(".svg"))).toEqual([]);
    for (const icon of new Set(icons)) {
      const res = await fetch(`${server.url}${icon}`);
      expect({ icon, status: res.status, type: res.headers.get("content-type") }).toEqual({ icon, status: 200, type: "image/png" });
    }
    expect(phone.unexpected()).toEqual([]);
  } finally {
    await phone.close();
  }
});

test("the PNG icons are the drawing in public/favicon.svg, as `npm run icons` renders it", async () => {
  // Only the PNGs reach a browser (above); a change to the drawing that was not rendered again would leave the tab,
  // the home screen and the install prompt showing the old one. Anti-aliasing may differ by a level or two between
  // Chromium builds; a changed colour or shape changes far more than 0.5 % of the channels by more than 16 levels.
  const desk = await openBrowser();
  try {
    const { page } = desk;
    const svg = fs.readFileSync(path.resolve("public/favicon.svg"), "utf8");
    for (const { file, size, fullBleed } of ICONS) {
      const drawn = await renderIcon(page, svg, size, fullBleed);
      const committed = fs.readFileSync(path.resolve("public", file));
      const compared = await page.evaluate(
        async ([a, b]) => {
          const pixels = async (base64: string) => {
            const img = new Image();
            img.src = `data:image/png;base64,${base64}`;
            await img.decode();
            const canvas = new OffscreenCanvas(img.width, img.height);
            const g = canvas.getContext("2d")!;
            g.drawImage(img, 0, 0);
            return { width: img.width, height: img.height, data: g.getImageData(0, 0, img.width, img.height).data };
          };
          const [x, y] = [await pixels(a), await pixels(b)];
          let far = 0;
          for (let i = 0; i < Math.min(x.data.length, y.data.length); i++) if (Math.abs(x.data[i]! - y.data[i]!) > 16) far++;
          return { size: [y.width, y.height], sameSize: x.width === y.width && x.height === y.height, farShare: far / x.data.length };
        },
        [drawn.toString("base64"), committed.toString("base64")] as const,
      );
      expect({ file, size: compared.size, sameSize: compared.sameSize }).toEqual({ file, size: [size, size], sameSize: true });
      expect(compared.farShare, file).toBeLessThanOrEqual(0.005);
    }
    expect(desk.unexpected()).toEqual([]);
  } finally {
    await desk.close();
  }
});
