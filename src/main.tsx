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
import { createAppRouter } from "./app/router";

const container = document.getElementById("root");
if (!container) throw new Error("Missing #root element in index.html");

// A first page the server sent already drawn (src/prerender.tsx: "/" and "/read", only for a visitor without a session
// cookie, so nobody is signed in) is hydrated; every other page is drawn here.
const drawn = container.firstElementChild !== null;
void createAppRouter({ drawn }).then((router) => {
  const app = <App router={<RouterProvider router={router} />} signedOut={drawn} />;
  // Hydrating inside a transition lets React do it in slices that yield to the browser (a tap on the drawn page is
  // not held up behind one long task); a page drawn here has nothing on screen yet, so it renders at once.
  if (drawn) startTransition(() => void hydrateRoot(container, app));
  else createRoot(container).render(app);
});
