// Registers the service worker (vite-plugin-pwa, registerType "prompt") after the page has loaded, and asks before a
// new version takes over. In development the plugin's module is a stand-in that registers nothing.
import { useEffect } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { useRegisterSW } from "virtual:pwa-register/react";
import { UpdatePrompt } from "./update-prompt";

/** How often an open app looks for a new version (a phone left open on the course for hours). */
const CHECK_EVERY_MS = 60 * 60 * 1000;

export function ServiceWorker() {
  const queryClient = useQueryClient();
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      if (!registration) return;
      setInterval(() => {
        if (navigator.onLine) void registration.update().catch(() => undefined);
      }, CHECK_EVERY_MS);
    },
  });

  // The very first worker takes over this page after its data was fetched: fetch the page's data again through it,
  // so the screen open now (a session being logged) also opens with no signal.
  useEffect(() => {
    if (typeof navigator === "undefined" || !("serviceWorker" in navigator) || navigator.serviceWorker.controller) return;
    const container = navigator.serviceWorker;
    const taken = () => void queryClient.refetchQueries({ type: "active" });
    container.addEventListener("controllerchange", taken, { once: true });
    return () => container.removeEventListener("controllerchange", taken);
  }, [queryClient]);

  const reload = () => {
    // The plugin reloads only a page that was already under a worker when it opened; a first visit's page too.
    navigator.serviceWorker?.addEventListener("controllerchange", () => window.location.reload(), { once: true });
    void updateServiceWorker(true);
  };
  return <UpdatePrompt needRefresh={needRefresh} onReload={reload} onDismiss={() => setNeedRefresh(false)} />;
}
