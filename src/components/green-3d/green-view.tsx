// The 3D green as a page uses it: WebGL is checked before any Canvas is created, the Canvas module is loaded lazily
// (three.js lives in its own chunk), and an error boundary around it falls back to the flat putt diagram with a
// message saying why.
import { lazy, Suspense, type ReactNode } from "react";
import clsx from "clsx";
import { ErrorBoundary, Spinner } from "../ui";
import { PuttDiagram, type PuttLineStyle } from "../putt-diagram/putt-diagram";
import { LINE_NAMES, type GreenSceneProps, type LineStyle } from "./scene-types";

const GreenScene = lazy(() => import("./green-scene"));

// The flat diagram knows three line styles; the trainer's true line and the player's own map onto them.
const FLAT_STYLE: Record<LineStyle, PuttLineStyle> = { chosen: "chosen", truth: "chosen", dying: "dying", firm: "firm", yours: "firm" };

export type GreenViewProps = GreenSceneProps & {
  className?: string;
  /** From useWebGL(), asked by the page so it can also hide controls that only the 3D view has. */
  webgl: boolean;
  /** A bar under the 3D view (the camera buttons); not drawn over it, where it would hide the ball or the hole. */
  toolbar?: ReactNode;
};

export function GreenView({ className, webgl, toolbar, ...props }: GreenViewProps) {
  const flat = (message: string) => (
    <div className="flex size-full flex-col">
      <p role="status" className="bg-warn-50 px-4 py-2 text-sm text-warn-800">
        {message}
      </p>
      <div className="min-h-0 flex-1">
        <div className="mx-auto aspect-[320/440] h-full max-w-full">
          <PuttDiagram
            paths={props.lines.map((l) => ({ points: l.path, style: FLAT_STYLE[l.style], label: l.label ?? LINE_NAMES[l.style] }))}
            holeDistanceM={props.putt.distanceM}
            aimSpots={props.aims.map((a) => ({ xM: a.xM, style: FLAT_STYLE[a.style] }))}
            fallLineDeg={props.putt.fallLineDeg}
            units={props.units}
            description={props.label}
          />
        </div>
      </div>
    </div>
  );
  return (
    <>
      <div className={clsx("relative", className)}>
        {webgl ? (
          <ErrorBoundary fallback={() => flat("The 3D green could not be shown on this device, so here is the putt seen from above.")}>
            <Suspense
              fallback={
                <div className="flex size-full items-center justify-center">
                  <Spinner label="Loading the 3D green" />
                </div>
              }
            >
              <GreenScene {...props} />
            </Suspense>
          </ErrorBoundary>
        ) : (
          flat("This browser cannot draw the 3D green (WebGL is not available), so here is the putt seen from above.")
        )}
      </div>
      {webgl && toolbar ? <div className="flex justify-center border-t border-ink-900/10 bg-sand-50 p-2">{toolbar}</div> : null}
    </>
  );
}
