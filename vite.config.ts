import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression, defineAlgorithm } from "vite-plugin-compression2";
import { VitePWA } from "vite-plugin-pwa";
import { API_CACHE, OFFLINE_API_URL } from "./src/lib/offline-cache";

// The routes of the pages drawn at build time (scripts/prerender.ts: "/" and "/read"). When such a page hydrates, the
// router loads its route's chunk, and Vite's preload helper would first append a <link rel="modulepreload"> for each
// chunk it imports (15 for /read): on this machine ≈ 20 ms of main thread in the task that starts the app, and, in
// Lighthouse's alternating runs, /read's total blocking time 1073 → 514 ms and performance 76 → 86 without them (issue
// 18). Their chunks then load as the route's imports, in tasks of their own; the page is drawn meanwhile.
const DRAWN_ROUTE_MODULES = ["src/app/routes/home.tsx", "src/app/routes/read.tsx"];
const drawnRouteChunks = new Set<string>();

/** Notes the output file of each drawn page's route before Vite writes its dynamic imports' preload lists. */
function drawnRouteChunkFiles(): Plugin {
  return {
    name: "borrowline:drawn-route-chunks",
    apply: "build",
    enforce: "pre",
    generateBundle(_options, bundle) {
      drawnRouteChunks.clear();
      for (const chunk of Object.values(bundle)) {
        const id = chunk.type === "chunk" ? chunk.facadeModuleId?.replaceAll("\\", "/") : undefined;
        if (id && DRAWN_ROUTE_MODULES.some((m) => id.endsWith(`/${m}`))) drawnRouteChunks.add(chunk.fileName);
      }
      if (drawnRouteChunks.size !== DRAWN_ROUTE_MODULES.length)
        throw new Error(`drawn routes' chunks not all found: ${[...drawnRouteChunks]}`);
    },
  };
}

// The Express server runs Vite in middleware mode during development, so no proxy
// is configured here and `server.hmr` keeps its default.
export default defineConfig({
  // Brotli and gzip copies of every text asset beside it, served by express-static-gzip (server/frontend.ts).
  plugins: [
    drawnRouteChunkFiles(),
    react(),
    tailwindcss(),
    // Installable and usable with no signal (issue 14): a web app manifest and a Workbox service worker that
    // precaches the built app (after the first page has loaded: registration waits for the load event), serves
    // index.html for every page offline, and keeps a few API answers network-first (src/lib/offline-cache.ts).
    // registerType "prompt": a new version waits until the person taps Reload (src/app/update-prompt.tsx).
    VitePWA({
      registerType: "prompt",
      injectRegister: false,
      manifest: {
        name: "Borrowline",
        short_name: "Borrowline",
        description: "Putting and green-reading calculator and practice trainer for golfers and their coaches.",
        start_url: "/",
        scope: "/",
        display: "standalone",
        background_color: "#fbf7ef",
        theme_color: "#131d33",
        // Pictures only (2026-12-05, issue 18): Chromium draws an SVG icon, the tab's or the manifest's, as a
        // document of its own in the page's renderer while the page loads (~30 ms of its main thread, twice).
        icons: [
          { src: "/icon-192.png", sizes: "192x192", type: "image/png" },
          { src: "/icon-512.png", sizes: "512x512", type: "image/png" },
          { src: "/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
        ],
      },
      workbox: {
        // The brotli/gzip copies beside each asset are for the server, not the cache.
        globPatterns: ["**/*.{js,css,html,svg,png,woff2,webmanifest}"],
        // The three.js chunk is large; it is fetched in the background after the first page, never on its way.
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        navigateFallback: "/index.html",
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        // The first worker takes over the open page at once (there is no older version to wait for), so the API
        // answers the golfer fetches from then on are kept for offline use. A new version still waits for "Reload".
        clientsClaim: true,
        runtimeCaching: [
          {
            urlPattern: OFFLINE_API_URL,
            handler: "NetworkFirst",
            method: "GET",
            options: {
              cacheName: API_CACHE,
              networkTimeoutSeconds: 6,
              expiration: { maxEntries: 300, maxAgeSeconds: 14 * 24 * 3600 },
              cacheableResponse: { statuses: [200] },
            },
          },
        ],
      },
    }),
    compression({
      include: /\.(js|mjs|css|html|json|svg|txt|map)$/,
      algorithms: [defineAlgorithm("brotliCompress"), defineAlgorithm("gzip", { level: 9 })],
      threshold: 1024,
      deleteOriginalAssets: false,
    }),
  ],
  build: {
    outDir: "dist",
    emptyOutDir: true,
    // The manifest lets a test check which chunks the first page loads (three.js must not be one).
    manifest: true,
    sourcemap: false,
    modulePreload: { resolveDependencies: (file, deps) => (drawnRouteChunks.has(file) ? [] : deps) },
    rolldownOptions: {
      output: {
        // Heavy libraries get their own chunks; they are only reached through lazy routes,
        // so the first page never downloads them.
        codeSplitting: {
          groups: [
            {
              name: "three",
              test: /[\\/]node_modules[\\/](three|@react-three|three-stdlib|troika-[^\\/]+|camera-controls|maath)[\\/]/,
              priority: 30,
            },
            { name: "charts", test: /[\\/]node_modules[\\/](recharts|d3-[^\\/]+|victory-vendor|decimal\.js-light)[\\/]/, priority: 20 },
            // Highest priority: a group also takes its modules' dependencies, so if "three" (which imports React)
            // outranked this one, React would land in the three chunk and the entry would have to load it.
            // use-sync-external-store (a React shim that zustand, used by @react-three/fiber, and react-redux, used by
            // recharts, both import) belongs here too: in the three chunk it made the charts chunk import three.js.
            // @babel/runtime's helpers too: drei and mathjs (the walked-green solver on the green map page) both use
            // them, and in the three chunk they made the green map page load three.js up front.
            {
              name: "react",
              test: /[\\/]node_modules[\\/](react|react-dom|scheduler|react-router|use-sync-external-store|@babel[\\/]runtime)[\\/]/,
              priority: 40,
            },
          ],
        },
      },
    },
  },
});
