import "./lib/zod-config";
import { StrictMode, Suspense, lazy, useEffect, useState, type ReactNode } from "react";
import { createRoot } from "react-dom/client";
import "@fontsource/lexend/400.css";
import "@fontsource/lexend/500.css";
import "@fontsource/lexend/600.css";
import "@fontsource/lexend/700.css";
import "./index.css";
import { AppProvider } from "./app/provider";
import { AppRouter } from "./app/router";

// The service worker's registration (and workbox-window) is not needed to draw the first page: it loads a few seconds
// after the page has loaded, so on a slow connection it never competes with the first screen (Workbox's own advice is
// to register after load). The worker then precaches the app in the background.
const ServiceWorker = lazy(() => import("./app/service-worker").then((m) => ({ default: m.ServiceWorker })));
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

const container = document.getElementById("root");
if (!container) throw new Error("Missing #root element in index.html");

createRoot(container).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
      <AfterFirstPage>
        <ServiceWorker />
      </AfterFirstPage>
    </AppProvider>
  </StrictMode>,
);
