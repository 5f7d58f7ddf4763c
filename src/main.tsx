import "./lib/zod-config";
import { startTransition } from "react";
import { createRoot, hydrateRoot } from "react-dom/client";
import { createBrowserRouter, RouterProvider } from "react-router";
import "@fontsource/lexend/400.css";
import "@fontsource/lexend/500.css";
import "@fontsource/lexend/600.css";
import "@fontsource/lexend/700.css";
import "./index.css";
import { App } from "./app/app";
import { createAppRouter, loadDrawnPageRoutes } from "./app/router";
import { forgetPlaceOnNewVisit } from "./app/scroll-positions";
import { seedDrawnQueries } from "./lib/drawn-queries";
import { nextTask } from "./lib/next-task";
import { createQueryClient } from "./lib/query-client";

const container = document.getElementById("root");
if (!container) throw new Error("Missing #root element in index.html");

// A new visit to a page opens at its top, not where this tab last left a page loaded fresh (src/app/scroll-positions.ts).
forgetPlaceOnNewVisit();

// A first page the server sent already drawn (src/prerender.tsx: "/" and "/read", only for a visitor without a session
// cookie, so nobody is signed in) is hydrated; every other page is drawn here.
const drawn = container.firstElementChild !== null;
if (drawn) {
  void hydrateDrawnPage(container);
} else {
  // Drawn here, at once, as the entry runs (nothing to wait for: the matched route loads as the router starts).
  createRoot(container).render(<App router={<RouterProvider router={createAppRouter()} />} />);
}

/**
 * Hydrates a drawn page in steps, each in a task of its own. The entry's modules have just run in this task; the
 * answers' seeding, matching the route, its module, the router's creation and the hydration's start came after them
 * in two tasks of 95 and 48 ms (/read, Chromium on the 2-core test machine, unthrottled; Lighthouse's phone
 * multiplies that by 4); split, the longest task of a load went from 83 to 55 ms of CPU time, now the entry's own
 * evaluation (issue 18, DEVELOPERS.md). The drawn page is on the screen all along, and its controls take no taps
 * until it is hydrated (src/index.css).
 */
async function hydrateDrawnPage(root: HTMLElement) {
  await nextTask();
  // The answers the drawing shows come with it (src/lib/drawn-queries.ts): the first render has them, as the drawing did.
  const queryClient = createQueryClient();
  seedDrawnQueries(queryClient, document);
  await nextTask();
  const routes = await loadDrawnPageRoutes();
  // The route's module has just run in this task; the router's creation (≈ 20 ms here, unthrottled) gets one of its own.
  await nextTask();
  const router = createBrowserRouter(routes);
  await nextTask();
  // Hydrating inside a transition lets React do it in slices that yield to the browser (a tap on the drawn page is
  // not held up behind one long task).
  startTransition(() => void hydrateRoot(root, <App router={<RouterProvider router={router} />} signedOut queryClient={queryClient} />));
}
