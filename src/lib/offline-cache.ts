// What the service worker keeps of the API for a phone with no signal (vite.config.ts, VitePWA runtimeCaching),
// and how sign-out forgets it. Only these GETs are kept, network first: the signed-in account, greens, sessions
// with their putts, and ladder assignments, so the logging screens open offline. Everything else under /api goes
// to the network alone (a read is solved in the browser when the network fails).
export const API_CACHE = "borrowline-api";

const ID = "[0-9a-f-]{36}";
const KEPT = ["me", "greens", `greens/${ID}`, "sessions", `sessions/${ID}`, `sessions/${ID}/putts`, "assignments", `assignments/${ID}`];

/**
 * The kept GETs as Workbox matches a RegExp route: against the whole URL (origin, path, query). A RegExp, not a
 * function, because the plugin copies it into the worker's source, where nothing from this module exists.
 */
export const OFFLINE_API_URL = new RegExp(`^https?://[^/]+/api/(${KEPT.join("|")})(\\?[^#]*)?$`);

/** Forgets every kept API answer (at sign-out: the next person on this phone must not see them offline). */
export async function clearOfflineApiCache(): Promise<void> {
  try {
    if (typeof caches !== "undefined") await caches.delete(API_CACHE);
  } catch {
    // No Cache Storage (an old browser, a private window): nothing was kept.
  }
}
