// The 3D view of a real green from its height map, as a page uses it: WebGL checked first, the scene (and three.js
// with it) loaded lazily in its own chunk, an error boundary that leaves the page's 2D map standing.
import { lazy, Suspense, type ReactNode } from "react";
import clsx from "clsx";
import { ErrorBoundary, Spinner } from "../ui";
import type { SurfaceSceneProps } from "./surface-types";

const SurfaceScene = lazy(() => import("./surface-scene"));

export type SurfaceViewProps = SurfaceSceneProps & {
  className?: string;
  /** From useWebGL(). */
  webgl: boolean;
  /** A bar under the view (the camera buttons). */
  toolbar?: ReactNode;
};

export function SurfaceView({ className, webgl, toolbar, ...props }: SurfaceViewProps) {
  const none = (message: string) => (
    <div className="flex size-full items-center justify-center p-6">
      <p role="status" className="max-w-sm text-center text-sm text-warn-800">
        {message}
      </p>
    </div>
  );
  return (
    <>
      <div className={clsx("relative", className)}>
        {webgl ? (
          <ErrorBoundary
            fallback={() => none("The 3D green could not be shown on this device. The map above shows the same surface from above.")}
          >
            <Suspense
              fallback={
                <div className="flex size-full items-center justify-center">
                  <Spinner label="Loading the 3D green" />
                </div>
              }
            >
              <SurfaceScene {...props} />
            </Suspense>
          </ErrorBoundary>
        ) : (
          none("This browser cannot draw the 3D green (WebGL is not available). The map above shows the same surface from above.")
        )}
      </div>
      {webgl && toolbar ? <div className="flex justify-center border-t border-ink-900/10 bg-sand-50 p-2">{toolbar}</div> : null}
    </>
  );
}
