import { Suspense, useEffect, useId, useLayoutEffect, type ReactNode } from "react";

// A part of a page drawn at build time (src/prerender.tsx) that React hydrates on its own, after the page around it
// (issue 18). React leaves a finished Suspense boundary of the drawing for later and hydrates it in a pass of its own,
// so the page's hydration ends in two shorter tasks instead of one long one (its commit, and the passive effects a
// form's first update flushes with it). On a page drawn in the browser it is a plain boundary that never suspends.
// The drawn page's controls take taps once every part has hydrated: the shell (App) and each part report here, and
// the last one removes the `data-drawn` mark (src/index.css).

const waiting = new Set<string>();
let shellHydrated = false;

function releaseIfDone() {
  if (shellHydrated && waiting.size === 0) document.documentElement.removeAttribute("data-drawn");
}

function partDone(id: string) {
  waiting.delete(id);
  releaseIfDone();
}

/** App's tree around the parts has hydrated (or was drawn in the browser). */
export function drawnShellHydrated() {
  shellHydrated = true;
  releaseIfDone();
}

function PartHydrated({ id }: { id: string }) {
  useEffect(() => partDone(id), [id]);
  return null;
}

export function DrawnPart({ children }: { children: ReactNode }) {
  const id = useId();
  // Layout effects run in the commit that has this boundary but, while hydrating, not yet its content: the part is
  // waited for until PartHydrated's effect runs (at once, in the same commit, when nothing was drawn).
  useLayoutEffect(() => {
    waiting.add(id);
    return () => partDone(id);
  }, [id]);
  return (
    <Suspense fallback={null}>
      {children}
      <PartHydrated id={id} />
    </Suspense>
  );
}
