import clsx from "clsx";
import type { CameraView } from "./scene-types";

const VIEWS: { view: CameraView; label: string }[] = [
  { view: "behind", label: "Behind the ball" },
  { view: "above", label: "From above" },
  { view: "free", label: "Free view" },
];

/** The camera's named views. "Free view" is the one to drag around (mouse, touch, or a two-finger pinch to zoom). */
export function CameraButtons({ view, onView }: { view: CameraView; onView: (v: CameraView) => void }) {
  return (
    <div role="group" aria-label="Camera" className="flex flex-wrap justify-center gap-1 rounded-xl bg-ink-900 p-1">
      {VIEWS.map((v) => (
        <button
          key={v.view}
          type="button"
          aria-pressed={view === v.view}
          onClick={() => onView(v.view)}
          className={clsx(
            "min-h-11 rounded-lg px-2.5 text-sm font-medium transition-colors focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500",
            view === v.view ? "bg-sand-50 text-ink-900" : "text-sand-50 hover:bg-sand-50/15",
          )}
        >
          {v.label}
        </button>
      ))}
    </div>
  );
}
