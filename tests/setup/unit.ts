// An unexpected console.error fails the test that caused it.
import { afterEach, vi } from "vitest";

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
