import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";

// Two projects: fast unit/API tests (node or jsdom per file) and browser tests
// that drive Debian's Chromium through playwright-core against a real server.
export default defineConfig({
  test: {
    // Two files at a time (vitest otherwise keeps one core free, which on CI's two cores runs the files one by one):
    // most API files wait on servers, child processes and the disk, so two overlap well. Browser files too, though
    // less (each runs about 1.6× slower beside another; the suite 13.6 → 11.5 min): every file starts its own server
    // on its own port and data directory, and its own Chromium.
    maxWorkers: 2,
    projects: [
      {
        plugins: [react()],
        test: {
          name: "unit",
          include: [
            "physics/**/*.test.ts",
            "shared/**/*.test.ts",
            "server/**/*.test.ts",
            "src/**/*.test.{ts,tsx}",
            "tests/api/**/*.test.ts",
          ],
          environment: "node",
          setupFiles: ["tests/setup/unit.ts"],
          globalSetup: ["tests/setup/global-unit.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          globalSetup: ["tests/e2e/global-setup.ts"],
          environment: "node",
          testTimeout: 90_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
