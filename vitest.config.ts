import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import type { InlineConfig } from "vitest/node";

// What the unit and API projects share: node, the console guard and the shared global set-up.
const nodeTestOptions: InlineConfig = {
  environment: "node",
  setupFiles: ["tests/setup/unit.ts"],
  globalSetup: ["tests/setup/global-unit.ts"],
  testTimeout: 30_000,
  hookTimeout: 60_000,
};

// Three projects: unit tests (physics, shared code, the client's components in jsdom), API and server tests (node),
// and browser tests that drive Debian's Chromium through playwright-core against a real server.
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
          include: ["physics/**/*.test.ts", "shared/**/*.test.ts", "src/**/*.test.{ts,tsx}"],
          ...nodeTestOptions,
        },
      },
      {
        test: {
          name: "api",
          include: ["server/**/*.test.ts", "tests/api/**/*.test.ts"],
          ...nodeTestOptions,
          // Each file starts its own servers and databases, and none mocks a module, so the files of a worker share
          // one import of the server and its libraries instead of importing them again per file (2026-12-04: the API
          // and server tests 433 → 326 s, 13.2 → 9.6 CPU-minutes; CI was near its 30-minute limit).
          isolate: false,
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
