import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
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
    app.get("/{*any}", (_req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      res.sendFile(indexHtml);
    });
  };
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
