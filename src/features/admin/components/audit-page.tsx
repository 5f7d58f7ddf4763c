import { formatDate } from "#shared/format";
import { useState } from "react";
import { Alert, Button, EmptyState, PageHeader } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useAudit } from "../api/admin";
import { auditWords } from "../utils/audit-words";

/** What every admin did, newest first: who, what, to whom, when. */
export function AdminAuditPage() {
  const [page, setPage] = useState(1);
  const audit = useAudit(page);
  const pages = audit.data ? Math.max(1, Math.ceil(audit.data.total / audit.data.pageSize)) : 1;
  return (
    <>
      <title>Audit · Admin · Borrowline</title>
      <PageHeader
        eyebrow="Admin"
        title="Audit"
        description="Every admin action, newest first. Entries cannot be edited or removed from here."
      />
      {audit.isError ? (
        <Alert
          tone="error"
          title="Could not load the audit list"
          action={
            <Button size="sm" variant="secondary" onClick={() => void audit.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(audit.error)}
        </Alert>
      ) : !audit.data ? (
        <div className="h-48 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the audit list" />
      ) : audit.data.entries.length === 0 ? (
        <EmptyState title="Nothing recorded yet">
          Role changes, bans, sign-outs and password-reset e-mails sent from the Accounts page are listed here.
        </EmptyState>
      ) : (
        <>
          <ol
            className="divide-y divide-ink-900/10 rounded-(--radius-card) bg-white px-4 ring-1 ring-ink-900/10 sm:px-5"
            data-testid="audit-list"
          >
            {audit.data.entries.map((e) => (
              <li key={e.id} className="flex flex-col gap-0.5 py-3 sm:flex-row sm:gap-4">
                <time dateTime={e.createdAt} className="shrink-0 text-sm text-ink-500 tabular-nums sm:w-52">
                  {formatDate(e.createdAt, "instant")}
                </time>
                <p className="text-ink-800">
                  <span className="font-semibold break-all">{e.actor.email}</span> {auditWords(e)}
                </p>
              </li>
            ))}
          </ol>
          {pages > 1 ? (
            <nav aria-label="Pages" className="mt-4 flex items-center gap-3">
              <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
                Newer
              </Button>
              <span className="text-sm text-ink-600">
                Page {page} of {pages}
              </span>
              <Button size="sm" variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
                Older
              </Button>
            </nav>
          ) : null}
        </>
      )}
    </>
  );
}
