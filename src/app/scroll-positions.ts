// Where a page opens scrolled to. React Router's <ScrollRestoration> keeps the place of each history entry under the
// entry's key, and gives it back when the entry is shown again. But a page loaded fresh (an address typed, a link in
// an e-mail, the sign-in page after signing out) is always the entry "default", so the place kept for the last page
// loaded in the tab came back on the next one: after a read scrolled to its answer, /sign-in opened at its bottom.
// Here a page loaded fresh is kept under its path instead, and forgotten when that path is loaded fresh again: it
// opens at its top (or at its #anchor), as a browser opens a new page; a reload or Back/Forward keeps the place. The
// path without its query: /read writes the read into its address without a router navigation, so the router's
// location (the key saved as the page goes) and the address reloaded (the key looked up) differ only there.
import type { Location } from "react-router";

/** The sessionStorage entry the places are kept in (one tab's; given to <ScrollRestoration storageKey>). */
export const SCROLL_POSITIONS_KEY = "borrowline-scroll-positions";

/** The key a place is kept under (<ScrollRestoration getKey>): the history entry's, or for a page loaded fresh, its path. */
export function scrollKey(location: Pick<Location, "key" | "pathname">): string {
  return location.key === "default" ? location.pathname : location.key;
}

/** How this document was loaded: "navigate" (a new visit), "reload" or "back_forward". */
function loadType(): string | undefined {
  const [entry] = globalThis.performance?.getEntriesByType?.("navigation") ?? [];
  return (entry as PerformanceNavigationTiming | undefined)?.type;
}

/** On a new visit, forgets the place kept for this path, so the page opens at its top. Runs before the app renders. */
export function forgetPlaceOnNewVisit(address: Pick<Location, "pathname"> = window.location): void {
  if (loadType() !== "navigate") return;
  try {
    const kept = sessionStorage.getItem(SCROLL_POSITIONS_KEY);
    if (!kept) return;
    const places = JSON.parse(kept) as Record<string, number>;
    const key = scrollKey({ key: "default", pathname: address.pathname });
    if (!(key in places)) return;
    delete places[key];
    sessionStorage.setItem(SCROLL_POSITIONS_KEY, JSON.stringify(places));
  } catch {
    // No sessionStorage (a blocked store) or an entry that is not JSON: the router keeps nothing usable there either.
  }
}
