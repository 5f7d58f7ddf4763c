import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { compression, defineAlgorithm } from "vite-plugin-compression2";

// The Express server runs Vite in middleware mode during development, so no proxy
// is configured here and `server.hmr` keeps its default.
export default defineConfig({
  // Brotli and gzip copies of every text asset beside it, served by express-static-gzip (server/frontend.ts).
  plugins: [
    react(),
    tailwindcss(),
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
    rolldownOptions: {
      output: {
        // Heavy libraries get their own chunks; they are only reached through lazy routes,
        // so the first page never downloads them.
        codeSplitting: {
          groups: [
            { name: "three", test: /[\\/]node_modules[\\/](three|@react-three|three-stdlib|troika-[^\\/]+|camera-controls|maath)[\\/]/, priority: 30 },
            { name: "charts", test: /[\\/]node_modules[\\/](recharts|d3-[^\\/]+|victory-vendor|decimal\.js-light)[\\/]/, priority: 20 },
            // Highest priority: a group also takes its modules' dependencies, so if "three" (which imports React)
            // outranked this one, React would land in the three chunk and the entry would have to load it.
            // use-sync-external-store (a React shim that zustand, used by @react-three/fiber, and react-redux, used by
            // recharts, both import) belongs here too: in the three chunk it made the charts chunk import three.js.
            { name: "react", test: /[\\/]node_modules[\\/](react|react-dom|scheduler|react-router|use-sync-external-store)[\\/]/, priority: 40 },
          ],
        },
      },
    },
  },
});
