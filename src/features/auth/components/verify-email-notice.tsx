import { useState } from "react";
import { toast } from "../../../lib/toast";
import { paths } from "../../../config/paths";
import { useMe } from "../api/get-me";
import { describeAuthError } from "../utils/auth-errors";

const DISMISSED_KEY = "borrowline.verify-notice-dismissed";

function readDismissed(): boolean {
  try {
    return sessionStorage.getItem(DISMISSED_KEY) === "1";
  } catch {
    return false;
  }
}

/** A slim bar for a signed-in user whose e-mail is not confirmed yet. */
export function VerifyEmailNotice() {
  const me = useMe();
  const [dismissed, setDismissed] = useState(readDismissed);
  const [sending, setSending] = useState(false);
  const user = me.data?.user;
  if (!user || user.emailVerified || dismissed) return null;

  const dismiss = () => {
    setDismissed(true);
    try {
      sessionStorage.setItem(DISMISSED_KEY, "1");
    } catch {
      // Private windows may refuse storage; the notice just comes back next visit.
    }
  };

  const resend = async () => {
    setSending(true);
    try {
      // better-auth's client is loaded when it is needed, not with every first page (the notice is in the shell).
      const { authClient } = await import("../../../lib/auth-client");
      const { error } = await authClient.sendVerificationEmail({ email: user.email, callbackURL: paths.home.href() });
      if (error) toast.error(describeAuthError(error, "Could not send the e-mail.").message);
      else toast.success(`Sent a new confirmation link to ${user.email}.`);
    } catch {
      toast.error("Could not reach Borrowline. Check your connection and try again.");
    } finally {
      setSending(false);
    }
  };

  return (
    <div role="status" className="border-b border-warn-600/30 bg-warn-50 text-warn-800">
      <div className="mx-auto flex max-w-6xl items-center gap-x-2 px-4 py-1 text-sm sm:gap-x-4 sm:px-6">
        <p className="min-w-0 flex-1 py-2">Check your inbox to confirm your e-mail.</p>
        <button
          type="button"
          onClick={() => {
            if (!sending) void resend();
          }}
          aria-disabled={sending || undefined}
          className="min-h-11 shrink-0 rounded-md px-2 font-medium whitespace-nowrap underline underline-offset-4 hover:text-ink-900 aria-disabled:opacity-60"
        >
          {sending ? "Sending…" : "Send again"}
        </button>
        <button
          type="button"
          onClick={dismiss}
          aria-label="Dismiss the e-mail confirmation notice"
          className="flex size-11 shrink-0 items-center justify-center rounded-md hover:bg-warn-600/10"
        >
          <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5 fill-current">
            <path d="M5.3 5.3a1 1 0 0 1 1.4 0L10 8.6l3.3-3.3a1 1 0 1 1 1.4 1.4L11.4 10l3.3 3.3a1 1 0 0 1-1.4 1.4L10 11.4l-3.3 3.3a1 1 0 0 1-1.4-1.4L8.6 10 5.3 6.7a1 1 0 0 1 0-1.4Z" />
          </svg>
        </button>
      </div>
    </div>
  );
}
