import "./lib/zod-config";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import "@fontsource/lexend/400.css";
import "@fontsource/lexend/500.css";
import "@fontsource/lexend/600.css";
import "@fontsource/lexend/700.css";
import "./index.css";
import { AppProvider } from "./app/provider";
import { AppRouter } from "./app/router";
import { ServiceWorker } from "./app/service-worker";

const container = document.getElementById("root");
if (!container) throw new Error("Missing #root element in index.html");

createRoot(container).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
      <ServiceWorker />
    </AppProvider>
  </StrictMode>,
);
