import { useSyncExternalStore } from "react";
import { onlineManager } from "@tanstack/react-query";

/** Whether the browser says it is online, as TanStack Query sees it (the same signal that resumes paused putts). */
export function useOnline(): boolean {
  return useSyncExternalStore(
    (onChange) => onlineManager.subscribe(onChange),
    () => onlineManager.isOnline(),
    () => true,
  );
}
