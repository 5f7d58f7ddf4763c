import "./lib/zod-config";
import { startTransition } from "react";
import { createRoot, hydrateRoot } from "react-dom/client";
import { RouterProvider } from "react-router";
import "@fontsource/lexend/400.css";
import "@fontsource/lexend/500.css";
import "@fontsource/lexend/600.css";
import "@fontsource/lexend/700.css";
import "./index.css";
import { App } from "./app/app";
import { createAppRouter, createHydratingRouter } from "./app/router";
import { seedDrawnQueries } from "./lib/drawn-queries";
import { createQueryClient } from "./lib/query-client";

const container = document.getElementById("root");
if (!container) throw new Error("Missing #root element in index.html");

// A first page the server sent already drawn (src/prerender.tsx: "/" and "/read", only for a visitor without a session
// cookie, so nobody is signed in) is hydrated; every other page is drawn here.
const drawn = container.firstElementChild !== null;
if (drawn) {
  // Hydrating inside a transition lets React do it in slices that yield to the browser (a tap on the drawn page is
  // not held up behind one long task).
  // The answers the drawing shows come with it (src/lib/drawn-queries.ts): the first render has them, as the drawing did.
  const queryClient = createQueryClient();
  seedDrawnQueries(queryClient, document);
  void createHydratingRouter().then((router) =>
    startTransition(
      () => void hydrateRoot(container, <App router={<RouterProvider router={router} />} signedOut queryClient={queryClient} />),
    ),
  );
} else {
  // Drawn here, at once, as the entry runs (nothing to wait for: the matched route loads as the router starts).
  createRoot(container).render(<App router={<RouterProvider router={createAppRouter()} />} />);
}
