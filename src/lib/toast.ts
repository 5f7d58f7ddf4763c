// Toasts, through sonner — loaded only when the app first says something in a toast: its 34 KiB of script
// (8.6 KiB brotli) and the stylesheet it inserts drew nothing on any first page, yet loading it as the app started put
// a fetch, its evaluation and a restyle of the whole page into hydration (issue 18). `toast` has sonner's shape for
// what the app uses. The first toast waits for sonner to arrive (the service worker keeps it after the first visit);
// sonner's <Toaster> (src/components/ui/toaster.tsx) starts then and shows the toasts still active, so none is lost.
type Sonner = typeof import("sonner");
type Options = { id?: string };

let want: () => void = () => {};
const sonnerOnceWanted: Promise<Sonner> = new Promise<void>((resolve) => (want = resolve)).then(() => import("sonner"));

/** sonner, fetched the first time it is asked for. */
function loadSonner(): Promise<Sonner> {
  want();
  return sonnerOnceWanted;
}

/** sonner, once something has asked for it (a toast); never fetches it itself. */
export function whenSonnerWanted(): Promise<Sonner> {
  return sonnerOnceWanted;
}

function show(kind: "success" | "error", message: string, options?: Options): void {
  void loadSonner().then((sonner) => sonner.toast[kind](message, options));
}

export const toast = {
  success: (message: string, options?: Options) => show("success", message, options),
  error: (message: string, options?: Options) => show("error", message, options),
};
