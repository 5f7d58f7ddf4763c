import { useEffect, useState } from "react";

/** `value`, once it has stopped changing for `delayMs` (compared by JSON, so a new array with the same numbers is no change). */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = window.setTimeout(() => setSettled(JSON.parse(key) as T), delayMs);
    return () => window.clearTimeout(timer);
  }, [key, delayMs]);
  return settled;
}
