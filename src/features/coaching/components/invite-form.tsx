import { useId, useState, type FormEvent } from "react";
import { Alert, Button, CopyLinkButton } from "../../../components/ui";
import { useCreateInvitations, type InviteOutcome } from "../api/create-invitations";
import { parseEmails } from "../utils/parse-emails";

/** One or several e-mail addresses; each gets its own link by e-mail. Shows what went out and what did not. */
export function InviteForm({ squadId, squadName }: { squadId: string; squadName: string }) {
  const id = useId();
  const [text, setText] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const [outcomes, setOutcomes] = useState<InviteOutcome[] | null>(null);
  const invite = useCreateInvitations();

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setOutcomes(null);
    const { valid, invalid } = parseEmails(text);
    if (invalid.length > 0) {
      setProblem(`${invalid.length === 1 ? "This is" : "These are"} not an e-mail address: ${invalid.join(", ")}`);
      return;
    }
    if (valid.length === 0) {
      setProblem("Enter at least one e-mail address.");
      return;
    }
    setProblem(null);
    const result = await invite.mutateAsync({ squadId, emails: valid });
    setOutcomes(result);
    // Keep only the addresses that did not go out, so they can be fixed and sent again.
    setText(
      result
        .filter((o) => !o.ok)
        .map((o) => o.email)
        .join("\n"),
    );
  };

  const sent = outcomes?.filter((o): o is Extract<InviteOutcome, { ok: true }> => o.ok) ?? [];
  const refused = outcomes?.filter((o): o is Extract<InviteOutcome, { ok: false }> => !o.ok) ?? [];

  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-3" aria-label={`Invite players to ${squadName}`}>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${id}-emails`} className="text-sm font-medium text-ink-800">
          E-mail addresses
        </label>
        <textarea
          id={`${id}-emails`}
          rows={3}
          value={text}
          onChange={(e) => setText(e.target.value)}
          aria-invalid={problem ? true : undefined}
          aria-describedby={problem ? `${id}-problem` : `${id}-hint`}
          placeholder="ivo@example.com, leena@example.com"
          className="block w-full rounded-xl border-2 border-ink-900/15 bg-white px-4 py-3 text-base text-ink-900 placeholder:text-ink-300 hover:border-ink-900/30 focus:border-ink-700 focus:outline-none aria-invalid:border-bad-600"
        />
        {problem ? (
          <p id={`${id}-problem`} className="text-sm font-medium text-bad-600">
            {problem}
          </p>
        ) : (
          <p id={`${id}-hint`} className="text-sm text-ink-500">
            One or several, separated by commas or new lines. Each player gets a link that works once, for 14 days.
          </p>
        )}
      </div>
      <Button type="submit" loading={invite.isPending} loadingText="Sending…" className="self-start">
        Send invitations
      </Button>
      {sent.length > 0 ? (
        <Alert tone="success" title={`Invitation${sent.length === 1 ? "" : "s"} sent`}>
          <p>
            E-mailed to {sent.map((o) => o.email).join(", ")}. You can also pass each link on yourself: it works once, for that address
            only.
          </p>
          <ul className="mt-2 flex flex-col gap-2">
            {sent.map((o) => (
              <li key={o.email} className="flex flex-wrap items-center gap-2">
                <span className="font-medium break-all">{o.email}</span>
                <CopyLinkButton
                  link={o.link}
                  linkName={`the invitation link for ${o.email}`}
                  accessibleName={`Copy the invitation link for ${o.email}`}
                />
              </li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {refused.length > 0 ? (
        <Alert tone="error" title="Not sent">
          <ul>
            {refused.map((o) => (
              <li key={o.email}>
                <span className="font-medium">{o.email}</span>: {o.message}
              </li>
            ))}
          </ul>
        </Alert>
      ) : null}
    </form>
  );
}
