import { useEffect, useRef, useState } from "react";
import { Button, type ButtonProps } from "./button";

export type CopyLinkButtonProps = {
  /** The link, or a function that gives it at the moment of the click (a page's own address). */
  link: string | (() => string);
  /** What the link is, for screen readers and the field shown when copying is refused ("the invitation link for …"). */
  linkName: string;
  label?: string;
  /** The button's name for screen readers when its text alone does not say which link (several on one screen). */
  accessibleName?: string;
  variant?: ButtonProps["variant"];
};

/**
 * Copies a link to the clipboard. Where the browser has no clipboard here (a page not served over HTTPS) or refuses,
 * the link is shown in a field, selected, to copy by hand. The button is the same in the page drawn at build time and
 * in the browser (nothing is decided before the click), so hydrating it changes nothing.
 */
export function CopyLinkButton({ link, linkName, label = "Copy link", accessibleName, variant = "secondary" }: CopyLinkButtonProps) {
  const [state, setState] = useState<"idle" | "copied" | "manual">("idle");
  const [shown, setShown] = useState("");
  const field = useRef<HTMLInputElement>(null);

  useEffect(() => {
    if (state === "manual") field.current?.select();
    if (state !== "copied") return;
    const back = window.setTimeout(() => setState("idle"), 2500);
    return () => window.clearTimeout(back);
  }, [state]);

  const copy = async () => {
    const text = typeof link === "function" ? link() : link;
    setShown(text);
    try {
      if (!navigator.clipboard) throw new Error("no clipboard");
      await navigator.clipboard.writeText(text);
      setState("copied");
    } catch {
      setState("manual");
    }
  };

  return (
    <span className="inline-flex max-w-full flex-col gap-1">
      <Button type="button" size="sm" variant={variant} aria-label={accessibleName} onClick={() => void copy()}>
        {state === "copied" ? "Link copied" : label}
      </Button>
      {state === "manual" ? (
        <input
          ref={field}
          readOnly
          aria-label={`${linkName[0]!.toUpperCase()}${linkName.slice(1)}, to copy`}
          value={shown}
          onFocus={(e) => e.currentTarget.select()}
          className="w-full min-w-0 rounded-lg border border-ink-900/15 bg-white px-2 py-1 text-sm"
        />
      ) : null}
      <span className="sr-only" aria-live="polite">
        {state === "copied" ? `Copied ${linkName}.` : state === "manual" ? `Copying was refused: ${linkName} is shown to copy.` : ""}
      </span>
    </span>
  );
}
