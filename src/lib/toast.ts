// Toasts, through sonner — loaded after the first page instead of with it: its 34 KiB of script (8.6 KiB brotli) drew
// nothing on any first page, yet every page evaluated it before its first frame (issue 18). `toast` has sonner's shape
// for what the app uses. A toast asked for before sonner has arrived is sent once it has, and sonner's <Toaster>
// (src/components/ui/toaster.tsx) shows the toasts still active when it starts listening, so none is lost.
type Sonner = typeof import("sonner");
type Options = { id?: string };

let loading: Promise<Sonner> | undefined;
export function loadSonner(): Promise<Sonner> {
  return (loading ??= import("sonner"));
}

function show(kind: "success" | "error", message: string, options?: Options): void {
  void loadSonner().then((sonner) => sonner.toast[kind](message, options));
}

export const toast = {
  success: (message: string, options?: Options) => show("success", message, options),
  error: (message: string, options?: Options) => show("error", message, options),
};
