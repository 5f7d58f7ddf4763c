import { Button } from "../components/ui";

export type UpdatePromptProps = {
  /** A new version has been downloaded and waits for the person's go-ahead. */
  needRefresh: boolean;
  /** Hands over to the new version and reloads the page. */
  onReload: () => void;
  onDismiss: () => void;
};

/**
 * "A new version is ready — Reload": shown when a new build's service worker is waiting. Nothing changes under the
 * person's hands (a putt being logged, a read being entered) until they choose to reload; "Later" keeps this version
 * until every Borrowline tab is closed.
 */
export function UpdatePrompt({ needRefresh, onReload, onDismiss }: UpdatePromptProps) {
  if (!needRefresh) return null;
  return (
    <div
      role="status"
      aria-live="polite"
      className="fixed inset-x-3 bottom-3 z-50 mx-auto flex max-w-md flex-wrap items-center gap-3 rounded-xl bg-ink-900 px-4 py-3 text-sand-50 shadow-lg sm:inset-x-auto sm:right-4 sm:bottom-4"
    >
      <p className="min-w-0 flex-1 text-sm font-medium">A new version is ready</p>
      <div className="flex gap-2">
        <Button size="sm" variant="on-dark" onClick={onDismiss}>
          Later
        </Button>
        <Button size="sm" variant="secondary" onClick={onReload}>
          Reload
        </Button>
      </div>
    </div>
  );
}
