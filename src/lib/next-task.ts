/**
 * Resolves in a later task of the browser's event loop, so the work after it does not lengthen the task now running:
 * a tap, a paint or a network callback waiting in between goes first (web.dev's "Optimize long tasks": yield to the
 * main thread). scheduler.yield() where the browser has it (its continuation goes ahead of other queued tasks), a
 * zero-delay timer otherwise.
 */
export function nextTask(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  return typeof scheduler?.yield === "function" ? scheduler.yield() : new Promise((resolve) => setTimeout(resolve, 0));
}
