// After an in-app navigation, focus moves to the new page's main heading, so a screen reader announces where the
// golfer now is and the next Tab starts from the page's top rather than from <body>. Not on the first load (the
// browser starts there anyway), and not when only the query changes (the read page writes its inputs into the
// address as the golfer types; focus must stay in the field).
import { useEffect, useRef } from "react";
import { useLocation } from "react-router";

/** How long to wait for a lazily loaded page to draw its heading. */
const WAIT_MS = 3000;

/** Focuses `root`'s first h1 once it exists (making it focusable by script only); returns a cancel function. */
export function focusHeadingWhenReady(root: () => HTMLElement | null, waitMs = WAIT_MS): () => void {
  let cancelled = false;
  const started = performance.now();
  let frame = 0;
  const tryFocus = () => {
    if (cancelled) return;
    const heading = root()?.querySelector("h1");
    if (heading instanceof HTMLElement) {
      if (!heading.hasAttribute("tabindex")) heading.setAttribute("tabindex", "-1");
      // Without scrolling: a new page starts at its top anyway (the router scrolls there), and after Back the router
      // has just put the page back where the golfer left it, which focusing the heading undid.
      heading.focus({ preventScroll: true });
      return;
    }
    if (performance.now() - started < waitMs) frame = requestAnimationFrame(tryFocus);
  };
  frame = requestAnimationFrame(tryFocus);
  return () => {
    cancelled = true;
    cancelAnimationFrame(frame);
  };
}

/** In the app shell: focus the new page's h1 inside `#main` after each change of path. */
export function useFocusHeadingOnNavigate(): void {
  const { pathname } = useLocation();
  // The path focus was last settled for: the first load's own path is never a navigation, even when React runs the
  // effect twice (StrictMode in development).
  const settled = useRef(pathname);
  useEffect(() => {
    if (settled.current === pathname) return;
    settled.current = pathname;
    return focusHeadingWhenReady(() => document.getElementById("main"));
  }, [pathname]);
}
