// An unexpected console.error fails the test that caused it.
import { afterAll, afterEach, beforeAll, vi } from "vitest";

const original = console.error;
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
