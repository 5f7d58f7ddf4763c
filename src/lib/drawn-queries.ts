// Answers a page drawn at build time already shows (src/prerender.tsx: the default read's aim and pace on /read),
// carried in the page as JSON so the browser's first render has them too: the hydration then matches the drawing,
// and the answer is on the screen before any script has run — no request, no spinner.
// A `<script type="application/json">` is data the browser never runs, so the Content-Security-Policy (no inline
// script) does not apply to it.
import type { QueryClient } from "@tanstack/react-query";

export type DrawnQuery = { queryKey: readonly unknown[]; data: unknown };

const ELEMENT_ID = "drawn-queries";

/** The element for the page; `<` is escaped so that nothing in the data can close it. */
export function drawnQueriesElement(queries: readonly DrawnQuery[]): string {
  return `<script type="application/json" id="${ELEMENT_ID}">${JSON.stringify(queries).replace(/</g, "\\u003c")}</script>`;
}

/** The drawn page's answers, put into `client` (nothing when the page was not drawn or carries none). */
export function seedDrawnQueries(client: QueryClient, doc: Document): void {
  const text = doc.getElementById(ELEMENT_ID)?.textContent;
  if (!text) return;
  for (const { queryKey, data } of JSON.parse(text) as DrawnQuery[]) client.setQueryData(queryKey, data);
}
