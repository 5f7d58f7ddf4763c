// An unexpected console.error fails the test that caused it.
import path from "node:path";
import { afterAll, afterEach, beforeAll, inject, vi } from "vitest";

// API files share one module registry per worker (vitest.config.ts, isolate: false) and this file runs again before
// each: wrap the console's own error function, not the wrapper an earlier file left.
const consoleState = globalThis as { consoleErrorBeforeTests?: typeof console.error };
const original = (consoleState.consoleErrorBeforeTests ??= console.error);
let errors: unknown[][] = [];
console.error = (...args: unknown[]) => {
  errors.push(args);
  original(...args);
};
afterEach(() => {
  const seen = errors;
  errors = [];
  if (seen.length > 0) {
    throw new Error(`console.error was called: ${seen.map((a) => a.map(String).join(" ")).join("\n")}`);
  }
  vi.restoreAllMocks();
});

// Component tests (jsdom) get the one network mock (src/testing/network.ts): a request that no handler answers
// is an error. Node tests (API, physics) keep the real network: they talk to a test server on loopback.
if (typeof window !== "undefined") {
  const { network } = await import("../../src/testing/network");
  beforeAll(() => network.listen({ onUnhandledRequest: "error" }));
  afterEach(() => {
    network.resetHandlers();
    network.events.removeAllListeners();
  });
  afterAll(() => network.close());
}

// A server started in this process (start() from source) builds a new database with the run's bundle of the builder
// (tests/setup/global-unit.ts), not through tsx, which compiled it again on every first start.
if (typeof window === "undefined") {
  const { useBuiltDatabaseBuilder } = await import("../../server/db/client");
  useBuiltDatabaseBuilder(path.join(inject("childBundleDir"), "pglite-create.js"));
}
