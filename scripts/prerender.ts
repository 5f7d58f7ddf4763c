// Part of `npm run build`, after `vite build`: draws the first pages a visitor without a session lands on ("/" and
// "/read") into dist/prerendered/, each the built index.html with the page's HTML (and the answers it shows) inside.
// server/frontend.ts sends them; src/main.tsx hydrates them (issue 18: the heading, the text and the read's answer
// paint when the HTML and CSS arrive, not after the JavaScript has run).
import fs from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import react from "@vitejs/plugin-react";
import { build } from "vite";
import { drawnQueriesElement, type DrawnQuery } from "../src/lib/drawn-queries";

// Their routes' modules are named in vite.config.ts too (DRAWN_ROUTE_MODULES: no preload list for their chunks).
const PRERENDERED_PAGES = [
  { url: "/", file: "home.html" },
  { url: "/read", file: "read.html" },
] as const;

const FIRST_PAINT_FONTS = [400, 500, 600];

const root = path.resolve(import.meta.dirname, "..");
const dist = path.join(root, "dist");

export async function prerender() {
  const template = fs.readFileSync(path.join(dist, "index.html"), "utf8");
  if (!template.includes('<div id="root"></div>')) throw new Error("dist/index.html has no empty #root to draw into");

  // Inside the project, so the drawing code finds the project's node_modules.
  const outDir = path.join(root, "node_modules/.cache/borrowline-prerender");
  try {
    await build({
      configFile: false,
      root,
      logLevel: "warn",
      plugins: [react()],
      build: {
        ssr: "src/prerender.tsx",
        outDir,
        emptyOutDir: true,
        minify: false,
        // The service worker's registration is the PWA plugin's virtual module; it loads only in a browser, after the
        // first page (src/app/app.tsx), so the drawing never reaches it.
        rolldownOptions: { external: [/^virtual:pwa-register/] },
      },
    });
    const { renderPage } = (await import(pathToFileURL(path.join(outDir, "prerender.js")).href)) as {
      renderPage: (url: string) => Promise<{ html: string; queries: DrawnQuery[] }>;
    };
    // Lexend's Latin faces in the weights the drawn pages use (body 400, labels 500, headings 600), fetched with the
    // CSS so the text is drawn in them from the first paint instead of swapping in later and moving it.
    const fontPreloads = FIRST_PAINT_FONTS.map((weight) => {
      const font = fs
        .readdirSync(path.join(dist, "assets"))
        .find((f) => f.startsWith(`lexend-latin-${weight}-normal-`) && f.endsWith(".woff2"));
      if (!font) throw new Error(`no Lexend ${weight} in dist/assets`);
      return `\n    <link rel="preload" as="font" type="font/woff2" crossorigin href="/assets/${font}">`;
    }).join("");
    fs.rmSync(path.join(dist, "prerendered"), { recursive: true, force: true });
    fs.mkdirSync(path.join(dist, "prerendered"));
    for (const page of PRERENDERED_PAGES) {
      const { html: drawn, queries } = await renderPage(`http://localhost${page.url}`);
      // React puts the page's <title> first in its output; it belongs in the head, in place of the template's, so the
      // tab is named before any script runs (React finds it there when it hydrates).
      const title = /^<title>[^<]*<\/title>/.exec(drawn)?.[0];
      if (!title) throw new Error(`${page.url} renders no <title> first`);
      const html = drawn.slice(title.length);
      // The route's own chunks are not preloaded: the page is drawn, answer included, and needs no script to be read.
      // The router fetches them as the app starts (src/app/router.tsx); preloaded, they shared the slow link with
      // the CSS and fonts that paint the page (Lighthouse, /read: LCP 2.8 s with them, 2.2 s without).
      const out = template
        .replace(/<title>[^<]*<\/title>/, title)
        .replace("</head>", `${fontPreloads}\n  </head>`)
        // The page is drawn: its scripts only make it work, so they wait behind the HTML, the CSS and the fonts (on a
        // slow link they would otherwise share it with what paints the page).
        .replace(/<(script type="module"|link rel="modulepreload") crossorigin/g, '<$1 fetchpriority="low" crossorigin')
        // The answers the drawing shows go with it, for the browser's first render (src/lib/drawn-queries.ts).
        .replace('<div id="root"></div>', `<div id="root">${html}</div>${queries.length > 0 ? drawnQueriesElement(queries) : ""}`)
        // Its controls take no taps until the app runs (src/index.css; App removes the mark once hydrated).
        .replace(/<html( [^>]*)?>/, (tag) => tag.replace(">", " data-drawn>"));
      fs.writeFileSync(path.join(dist, "prerendered", page.file), out);
    }
    fs.writeFileSync(
      path.join(dist, "prerendered", "pages.json"),
      JSON.stringify(Object.fromEntries(PRERENDERED_PAGES.map((p) => [p.url, p.file]))),
    );
  } finally {
    fs.rmSync(outDir, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) await prerender();
