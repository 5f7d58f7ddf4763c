// After `vite build` (the e2e global setup runs it): the first page's JS must not carry three.js, and the 3D scene
// must still be reachable, through a dynamic import only.
import fs from "node:fs";
import path from "node:path";
import { expect, test } from "vitest";
import { openBrowser, startAppServer } from "./harness";

type Chunk = {
  file: string;
  name?: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
};

const DIST = path.resolve("dist");
const manifest = JSON.parse(fs.readFileSync(path.join(DIST, ".vite/manifest.json"), "utf8")) as Record<string, Chunk>;
const read = (key: string) => fs.readFileSync(path.join(DIST, manifest[key]!.file), "utf8");
// Strings only three.js's renderer code contains (class names survive minification as strings and properties).
const THREE_MARKERS = ["WebGLRenderer", "WebGLShadowMap", "THREE.WebGLRenderer"];
const hasThree = (key: string) =>
  THREE_MARKERS.some((m) => read(key).includes(m)) || /three/i.test(manifest[key]!.name ?? "") || /three/i.test(manifest[key]!.file);

/** The chunk and every chunk it imports statically (what the browser loads before the module runs). */
function staticClosure(key: string): Set<string> {
  const seen = new Set<string>();
  const stack = [key];
  while (stack.length) {
    const k = stack.pop()!;
    if (seen.has(k)) continue;
    seen.add(k);
    for (const i of manifest[k]?.imports ?? []) stack.push(i);
  }
  return seen;
}

test("the entry chunk (index.html) and its static imports hold no three.js code", () => {
  expect(manifest["index.html"]?.isEntry).toBe(true);
  const first = [...staticClosure("index.html")];
  expect(first.length).toBeGreaterThan(0);
  expect(first.filter(hasThree)).toEqual([]);
});

test("the rehearse and training routes load three.js only through a dynamic import of the 3D scene", () => {
  for (const route of ["src/app/routes/rehearse.tsx", "src/app/routes/train.tsx"]) {
    const closure = staticClosure(route);
    expect([...closure].filter(hasThree)).toEqual([]);
    const dynamic = [...closure].flatMap((k) => manifest[k]?.dynamicImports ?? []);
    expect(dynamic).toContain("src/components/green-3d/green-scene.tsx");
  }
  // The check can fail: the scene's own static imports do hold three.js.
  expect([...staticClosure("src/components/green-3d/green-scene.tsx")].some(hasThree)).toBe(true);
});

test("the green map route loads three.js only through a dynamic import of the surface scene", () => {
  const closure = staticClosure("src/app/routes/green-map.tsx");
  expect([...closure].filter(hasThree)).toEqual([]);
  expect([...closure].flatMap((k) => manifest[k]?.dynamicImports ?? [])).toContain("src/components/green-3d/surface-scene.tsx");
  expect([...staticClosure("src/components/green-3d/surface-scene.tsx")].some(hasThree)).toBe(true);
});

test("recharts stays out of the first page too", () => {
  const first = [...staticClosure("index.html")];
  expect(first.filter((k) => /recharts|charts/i.test(manifest[k]!.name ?? "") || read(k).includes("recharts-wrapper"))).toEqual([]);
});

test("the first load of / and /read carries none of zod's full API (only zod/mini's builders for the read form)", () => {
  // zod's full builders (ZodString and the rest, 20 KiB of brotli) are for the pages that use the shared schemas; the
  // read form checks its text with zod/mini and /read's address with the same limits (shared/read-limits.ts).
  const classic = (key: string) => read(key).includes("`ZodString`") || read(key).includes('"ZodString"');
  expect(Object.keys(manifest).some(classic)).toBe(true); // the marker still finds the full API where it is
  for (const route of ["index.html", "src/app/routes/home.tsx", "src/app/routes/read.tsx"]) {
    expect(manifest[route], route).toBeDefined();
    expect([...staticClosure(route)].filter(classic), route).toEqual([]);
  }
});

// ---- per route: three.js only on the 3D pages; what is sent, compressed, in a real browser ----------------------

/** Every chunk a route can load: its static closure plus the lazy modules it imports itself (not other routes). */
function routeClosure(key: string): Set<string> {
  const seen = new Set<string>();
  const stack = [key];
  while (stack.length) {
    const k = stack.pop()!;
    if (seen.has(k)) continue;
    seen.add(k);
    for (const i of [
      ...(manifest[k]?.imports ?? []),
      ...(manifest[k]?.dynamicImports ?? []).filter((d) => !d.startsWith("src/app/routes/")),
    ])
      stack.push(i);
  }
  return seen;
}

const THREE_D_ROUTES = ["src/app/routes/rehearse.tsx", "src/app/routes/train.tsx", "src/app/routes/green-map.tsx"];

test("per route (Vite manifest): only the 3D pages can load three.js, and the charts chunk does not import it", () => {
  const routes = Object.keys(manifest).filter((k) => k.startsWith("src/app/routes/"));
  expect(routes.length).toBeGreaterThan(20);
  for (const route of routes) {
    const withThree = [...routeClosure(route)].filter(hasThree);
    if (THREE_D_ROUTES.includes(route)) expect(withThree.length, route).toBeGreaterThan(0);
    else expect(withThree, route).toEqual([]);
  }
  const charts = Object.keys(manifest).find((k) => manifest[k]!.name === "charts" && !k.startsWith("src/"));
  expect(charts).toBeDefined();
  expect([...staticClosure(charts!)].filter(hasThree)).toEqual([]);
});

test("built assets are served brotli-compressed and immutable; the page and the API are compressed too", async () => {
  const server = await startAppServer();
  try {
    const entry = manifest["index.html"]!.file;
    const asset = await fetch(`${server.url}/${entry}`, { headers: { "accept-encoding": "br, gzip" } });
    expect(asset.headers.get("content-encoding")).toBe("br");
    expect(asset.headers.get("cache-control")).toMatch(/immutable/);
    expect(asset.headers.get("content-type")).toMatch(/javascript/);
    const html = await fetch(`${server.url}/read`, { headers: { "accept-encoding": "gzip" } });
    expect(html.headers.get("content-encoding")).toBe("gzip");
    expect(await html.text()).toContain("<!doctype html");
    const plain = await fetch(`${server.url}/${entry}`, { headers: { "accept-encoding": "identity" } });
    expect(plain.headers.get("content-encoding")).toBeNull();
    expect((await plain.text()).length).toBeGreaterThan(1000);
  } finally {
    await server.stop();
  }
}, 60_000);

test("in Chromium: JavaScript sent for / and /read ≤ 200 KiB, /stats (signed in) ≤ 300 KiB, and none of them loads three.js", async () => {
  const server = await startAppServer();
  const browser = await openBrowser();
  try {
    const { page, context } = browser;
    const cdp = await context.newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.setCacheDisabled", { cacheDisabled: true });
    // Measure what a first visit sends: the service worker installed by the first page would serve the later ones.
    await cdp.send("Network.setBypassServiceWorker", { bypass: true });
    const urls = new Map<string, string>();
    let bytes = 0;
    let jsBytes = 0;
    const headerBytes = new Map<string, number>();
    cdp.on("Network.responseReceived", (e: { requestId: string; response: { url: string; encodedDataLength: number } }) => {
      urls.set(e.requestId, e.response.url);
      headerBytes.set(e.requestId, e.response.encodedDataLength);
    });
    const each: string[] = [];
    cdp.on("Network.loadingFinished", (e: { requestId: string; encodedDataLength: number }) => {
      bytes += e.encodedDataLength;
      // JavaScript counted as the issue measured it: the bodies as sent (compressed), without the response headers.
      if (/\.m?js$/.test(urls.get(e.requestId) ?? "")) jsBytes += e.encodedDataLength - (headerBytes.get(e.requestId) ?? 0);
      if (process.env.BUNDLE_DETAIL) each.push(`${(e.encodedDataLength / 1024).toFixed(1)} ${urls.get(e.requestId)}`);
    });
    const visit = async (route: string) => {
      urls.clear();
      bytes = 0;
      jsBytes = 0;
      await page.goto(server.url + route, { waitUntil: "networkidle" });
      return { bytes, jsBytes, urls: [...urls.values()] };
    };
    // JavaScript as sent (compressed bodies) is what the goal counts; every byte (headers, fonts, CSS, API) is printed beside it.
    const sent: Record<string, number> = {};
    const total: Record<string, number> = {};
    for (const route of ["/", "/read"]) {
      const r = await visit(route);
      sent[route] = r.jsBytes;
      total[route] = r.bytes;
      expect(
        r.urls.filter((u) => /three/i.test(u)),
        route,
      ).toEqual([]);
    }
    // Signed in (the cookie set by the page's own fetch), then /stats with its charts.
    await page.evaluate(async () => {
      const res = await fetch("/api/auth/sign-up/email", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          name: "Bundle Player",
          email: `bundle-${Date.now()}@example.test`,
          password: "bundle-test-password-1",
          accountType: "player",
        }),
      });
      if (!res.ok) throw new Error(`sign-up ${res.status}`);
      // A few putts, so the page draws its charts.
      const json = { "content-type": "application/json" };
      const session = await fetch("/api/sessions", { method: "POST", headers: json, body: JSON.stringify({ date: "2026-11-30" }) });
      const { id } = (await session.json()) as { id: string };
      for (let i = 0; i < 12; i++) {
        await fetch(`/api/sessions/${id}/putts`, {
          method: "POST",
          headers: json,
          body: JSON.stringify({ distanceM: 1 + (i % 6), holed: i % 2 === 0 }),
        });
      }
    });
    const stats = await visit("/stats");
    sent["/stats"] = stats.jsBytes;
    total["/stats"] = stats.bytes;
    expect(stats.urls.some((u) => /charts-/.test(u))).toBe(true);
    expect(stats.urls.filter((u) => /three/i.test(u))).toEqual([]);
    if (process.env.BUNDLE_DETAIL) console.log(each.join("\n"));
    console.log(
      `sent, KiB (JavaScript / everything): ${Object.keys(sent)
        .map((k) => `${k} ${(sent[k]! / 1024).toFixed(0)} / ${(total[k]! / 1024).toFixed(0)}`)
        .join(", ")}`,
    );
    expect(sent["/"]).toBeLessThanOrEqual(200 * 1024);
    expect(sent["/read"]).toBeLessThanOrEqual(200 * 1024);
    expect(sent["/stats"]).toBeLessThanOrEqual(300 * 1024);
  } finally {
    await browser.close();
    await server.stop();
  }
}, 120_000);
