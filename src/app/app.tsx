import { StrictMode, Suspense, lazy, useEffect, useState, type ReactNode } from "react";
import type { QueryClient } from "@tanstack/react-query";
import { drawnShellHydrated } from "../lib/drawn-part";
import { AppProvider } from "./provider";

// The service worker's registration (and workbox-window) is not needed to draw the first page: it loads a few seconds
// after the page has loaded, so on a slow connection it never competes with the first screen (Workbox's own advice is
// to register after load). The worker then precaches the app in the background.
const ServiceWorker = lazy(() => import("./service-worker").then((m) => ({ default: m.ServiceWorker })));
const REGISTER_AFTER_LOAD_MS = 3000;

function AfterFirstPage({ children }: { children: ReactNode }) {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const later = () => (timer = setTimeout(() => setReady(true), REGISTER_AFTER_LOAD_MS));
    if (document.readyState === "complete") later();
    else window.addEventListener("load", later, { once: true });
    return () => {
      window.removeEventListener("load", later);
      clearTimeout(timer);
    };
  }, []);
  return ready ? <Suspense fallback={null}>{children}</Suspense> : null;
}

/**
 * The whole app around its router: the browser (src/main.tsx) and the build-time drawing of first pages
 * (src/prerender.tsx) render this same tree, so the HTML drawn at build time is what the browser's first render
 * produces and React can hydrate it. `signedOut`: see AppProvider. `queryClient`: one that already holds the answers
 * a drawn page shows (the drawing's queries, src/lib/drawn-queries.ts), so the browser's first render has them too.
 */
export function App({ router, signedOut = false, queryClient }: { router: ReactNode; signedOut?: boolean; queryClient?: QueryClient }) {
  // The page is the app's now: a drawn page's controls take taps (src/index.css, html[data-drawn]) once its parts
  // have hydrated too (src/lib/drawn-part.tsx).
  useEffect(drawnShellHydrated, []);
  return (
    <StrictMode>
      <AppProvider signedOut={signedOut} queryClient={queryClient}>
        {router}
        <AfterFirstPage>
          <ServiceWorker />
        </AfterFirstPage>
      </AppProvider>
    </StrictMode>
  );
}
