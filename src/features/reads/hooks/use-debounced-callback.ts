import { useCallback, useEffect, useMemo, useRef } from "react";

/** A callback that runs `delayMs` after the last call; `flush` runs a pending call now, `cancel` drops it. */
export function useDebouncedCallback<A extends unknown[]>(fn: (...args: A) => void, delayMs: number) {
  const fnRef = useRef(fn);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const pendingArgs = useRef<A | null>(null);

  useEffect(() => {
    fnRef.current = fn;
  }, [fn]);
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  const cancel = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    pendingArgs.current = null;
  }, []);

  const flush = useCallback(() => {
    const args = pendingArgs.current;
    cancel();
    if (args) fnRef.current(...args);
  }, [cancel]);

  const call = useCallback(
    (...args: A) => {
      if (timer.current) clearTimeout(timer.current);
      pendingArgs.current = args;
      timer.current = setTimeout(() => {
        timer.current = null;
        pendingArgs.current = null;
        fnRef.current(...args);
      }, delayMs);
    },
    [delayMs],
  );

  return useMemo(() => ({ call, flush, cancel }), [call, flush, cancel]);
}
