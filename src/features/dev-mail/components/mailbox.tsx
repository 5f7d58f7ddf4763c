import { formatDate } from "#shared/format";
import { Alert, Button, Card, EmptyState, PageSpinner, textLinkClasses } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { useDevMail, type DevMailMessage } from "../api/get-dev-mail";
import { linkify } from "../utils/linkify";

function formatTime(iso: string): string {
  return formatDate(iso, "instant");
}

function MessageBody({ text }: { text: string }) {
  return (
    <pre className="mt-4 overflow-x-auto rounded-xl bg-white p-4 font-sans text-sm leading-relaxed break-words whitespace-pre-wrap text-ink-800 ring-1 ring-ink-900/10">
      {linkify(text).map((part, i) =>
        part.kind === "link" ? (
          <a key={i} href={part.href} className={`${textLinkClasses} break-all`}>
            {part.text}
          </a>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </pre>
  );
}

function MessageCard({ message }: { message: DevMailMessage }) {
  const headingId = `mail-${message.id}`;
  return (
    <Card aria-labelledby={headingId} role="article">
      <div className="flex flex-col gap-1 sm:flex-row sm:items-baseline sm:justify-between sm:gap-4">
        <h2 id={headingId} className="text-lg font-semibold">
          {message.subject || "(no subject)"}
        </h2>
        <p className="shrink-0 text-sm text-ink-500">
          <time dateTime={message.receivedAt}>{formatTime(message.receivedAt)}</time>
        </p>
      </div>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-ink-500">To</dt>
        <dd className="break-all">{message.to.join(", ")}</dd>
        <dt className="text-ink-500">From</dt>
        <dd className="break-all">{message.from}</dd>
      </dl>
      {message.text ? (
        <MessageBody text={message.text} />
      ) : (
        <p className="mt-4 text-sm text-ink-500">This message has no plain-text body.</p>
      )}
      {message.html ? (
        <details className="mt-3">
          <summary className="min-h-11 cursor-pointer rounded-md py-2 text-sm font-medium text-ink-700">Show the HTML version</summary>
          <iframe
            title={`HTML version of "${message.subject}"`}
            sandbox="allow-popups allow-popups-to-escape-sandbox"
            srcDoc={`<base target="_blank">${message.html}`}
            className="mt-2 h-96 w-full rounded-xl bg-white ring-1 ring-ink-900/10"
          />
        </details>
      ) : null}
    </Card>
  );
}

export function Mailbox() {
  const mail = useDevMail();

  if (mail.isPending) return <PageSpinner label="Loading the mailbox" />;
  if (mail.isError) {
    if (isApiError(mail.error) && mail.error.status === 404) {
      return (
        <Alert tone="info" title="No mailbox on this server">
          This server sends its e-mail through a mail server (SMTP_URL is set), so there is no local inbox.
        </Alert>
      );
    }
    if (isApiError(mail.error) && (mail.error.status === 401 || mail.error.status === 403)) {
      return (
        <Alert tone="info" title="The local inbox is for administrators">
          No mail server is set up, so the e-mail this server sends is held here instead of being delivered. It holds sign-in and invitation
          links, so only an administrator can read it.
        </Alert>
      );
    }
    return (
      <Alert
        tone="error"
        title="Could not load the mailbox"
        action={
          <Button size="sm" variant="secondary" className="shrink-0 whitespace-nowrap" onClick={() => void mail.refetch()}>
            Try again
          </Button>
        }
      >
        {mail.error.message}
      </Alert>
    );
  }

  const { messages } = mail.data;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex items-center justify-between gap-3">
        <p className="text-ink-500" aria-live="polite">
          {messages.length === 1 ? "1 message" : `${messages.length} messages`}, newest first. Checks for new mail every few seconds.
        </p>
        <Button size="sm" variant="secondary" className="shrink-0 whitespace-nowrap" onClick={() => void mail.refetch()}>
          Check now
        </Button>
      </div>
      {messages.length === 0 ? (
        <EmptyState title="No e-mail yet">Sign up or ask for a password reset, and the e-mail the server sends appears here.</EmptyState>
      ) : (
        <ol className="flex flex-col gap-4">
          {messages.map((message) => (
            <li key={message.id}>
              <MessageCard message={message} />
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
