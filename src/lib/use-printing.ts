import { useSyncExternalStore } from "react";

const PRINT = "print";

const canAsk = () => typeof window.matchMedia === "function";

function subscribe(onChange: () => void) {
  if (!canAsk()) return () => undefined;
  const query = window.matchMedia(PRINT);
  query.addEventListener("change", onChange);
  return () => query.removeEventListener("change", onChange);
}

/**
 * True while the page is laid out for print. A chart hidden in print (`print:hidden`) is not drawn then: measured
 * in a box of 0 × 0, recharts warns on every print.
 */
export function usePrinting(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => canAsk() && window.matchMedia(PRINT).matches,
    () => false,
  );
}
