import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

// The Express server runs Vite in middleware mode during development, so no proxy
// is configured here and `server.hmr` keeps its default.
export default defineConfig({
  plugins: [react(), tailwindcss()],
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
            { name: "react", test: /[\\/]node_modules[\\/](react|react-dom|scheduler|react-router)[\\/]/, priority: 40 },
          ],
        },
      },
    },
  },
});
