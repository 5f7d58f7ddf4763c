import { useState, type ReactNode } from "react";
import { Button, type ButtonProps } from "../../../components/ui";

export type ConfirmActionProps = {
  /** The first button's label, e.g. "Remove". */
  label: ReactNode;
  /** Its accessible name when the label alone is ambiguous in a list, e.g. "Remove Ivo Marsh". */
  ariaLabel?: string;
  /** What is about to happen, shown beside the confirm button. */
  question: ReactNode;
  confirmLabel: string;
  pendingLabel?: string;
  pending?: boolean;
  onConfirm: () => void;
  variant?: ButtonProps["variant"];
  size?: ButtonProps["size"];
};

/** A destructive action in two steps: the button, then a question with "Yes, …" and "Keep". */
export function ConfirmAction({
  label,
  ariaLabel,
  question,
  confirmLabel,
  pendingLabel,
  pending,
  onConfirm,
  variant = "ghost",
  size = "sm",
}: ConfirmActionProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button size={size} variant={variant} onClick={() => setAsking(true)} aria-label={ariaLabel}>
        {label}
      </Button>
    );
  }
  return (
    <div role="group" aria-label="Confirm" className="flex flex-wrap items-center gap-2">
      <span className="text-sm text-ink-700">{question}</span>
      <Button size="sm" variant="danger" loading={pending} loadingText={pendingLabel} onClick={onConfirm}>
        {confirmLabel}
      </Button>
      <Button size="sm" variant="ghost" onClick={() => setAsking(false)}>
        Keep
      </Button>
    </div>
  );
}
