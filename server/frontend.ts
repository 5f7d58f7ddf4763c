import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { getSessionCookie } from "better-auth/cookies";
import type { Express } from "express";
import expressStaticGzip from "express-static-gzip";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

/** Production: the built SPA from dist/, with history fallback for client routes. */
export function serveBuiltClient(distDir = path.join(root, "dist")) {
  const indexHtml = path.join(distDir, "index.html");
  if (!fs.existsSync(indexHtml)) {
    throw new Error(`The client is not built (${indexHtml} is missing). Run "npm run build" first.`);
  }
  return (app: Express) => {
    // Hashed assets: the build's own brotli/gzip copies (vite-plugin-compression2), cached for a year, immutable.
    app.use(
      "/assets",
      expressStaticGzip(path.join(distDir, "assets"), {
        enableBrotli: true,
        orderPreference: ["br", "gzip"],
        index: false,
        serveStatic: { immutable: true, maxAge: "1y", fallthrough: false },
      }),
    );
    app.use(
      expressStaticGzip(distDir, { enableBrotli: true, orderPreference: ["br", "gzip"], index: false, serveStatic: { index: false } }),
    );
    const drawnPages = prerenderedPages(distDir);
    app.get("/{*any}", (req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      // A first page drawn at build time (scripts/prerender.ts), only for a bare URL and a visitor without a session
      // cookie: the drawing is of a signed-out visitor's first view, and the browser hydrates it as that.
      res.setHeader("Vary", "Cookie");
      const drawn = drawnPages.get(req.path);
      const bare = !req.originalUrl.includes("?");
      const session = req.headers.cookie ? getSessionCookie(new Headers({ cookie: req.headers.cookie })) : null;
      res.sendFile(drawn && bare && !session ? drawn : indexHtml);
    });
  };
}

/** URL path → the drawn page's file, from dist/prerendered/pages.json (absent in a build without it: none drawn). */
function prerenderedPages(distDir: string): Map<string, string> {
  const dir = path.join(distDir, "prerendered");
  const list = path.join(dir, "pages.json");
  if (!fs.existsSync(list)) return new Map();
  const pages = JSON.parse(fs.readFileSync(list, "utf8")) as Record<string, string>;
  return new Map(Object.entries(pages).map(([url, file]) => [url, path.join(dir, file)]));
}

/** Development: Vite in middleware mode inside the same Express server (one origin, hot reload). */
export async function viteDevClient() {
  const { createServer } = await import("vite");
  const vite = await createServer({ root, server: { middlewareMode: true }, appType: "spa" });
  return {
    mount: (app: Express) => {
      app.use(vite.middlewares);
    },
    close: () => vite.close(),
  };
}
