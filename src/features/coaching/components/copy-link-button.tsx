import { useState } from "react";
import { Button } from "../../../components/ui";

/**
 * Copies an invitation link to the clipboard, for a coach who would rather send it themselves. When the
 * clipboard is not available (an insecure origin, a refused permission) the link is shown to copy by hand.
 */
export function CopyLinkButton({ link, label = "Copy link" }: { link: string; label?: string }) {
  const [state, setState] = useState<"idle" | "copied" | "manual">("idle");
  return (
    <span className="inline-flex flex-col gap-1">
      <Button
        type="button"
        size="sm"
        variant="secondary"
        onClick={async () => {
          try {
            await navigator.clipboard.writeText(link);
            setState("copied");
          } catch {
            setState("manual");
          }
        }}
      >
        {state === "copied" ? "Link copied" : label}
      </Button>
      {state === "manual" ? (
        <input
          readOnly
          aria-label="Invitation link"
          value={link}
          onFocus={(e) => e.currentTarget.select()}
          className="w-full rounded-lg border border-ink-900/15 px-2 py-1 text-sm"
        />
      ) : null}
      <span className="sr-only" aria-live="polite">
        {state === "copied" ? "The invitation link is on the clipboard." : ""}
      </span>
    </span>
  );
}
