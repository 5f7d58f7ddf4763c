import { formatDate } from "#shared/format";
import { Alert, Button, Card, CardTitle, EmptyState, PageHeader } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useAdminCoaching } from "../api/admin";

/** Every coach's squads and ladders, each with its owner's name and e-mail (read-only; the coach pages manage them). */
export function AdminCoachingPage() {
  const data = useAdminCoaching();
  return (
    <>
      <title>Squads and ladders · Admin · Borrowline</title>
      <PageHeader eyebrow="Admin" title="Squads and ladders" description="Every coach’s squads and ladders, with whose each one is." />
      {data.isError ? (
        <Alert
          tone="error"
          title="Could not load the squads and ladders"
          action={
            <Button size="sm" variant="secondary" onClick={() => void data.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(data.error)}
        </Alert>
      ) : !data.data ? (
        <div className="h-48 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading squads and ladders" />
      ) : (
        <div className="grid gap-6 lg:grid-cols-2">
          <Card>
            <CardTitle as="h2">Squads ({data.data.squads.length})</CardTitle>
            {data.data.squads.length === 0 ? (
              <EmptyState title="No squads yet">Coaches create squads from their Squads page.</EmptyState>
            ) : (
              <ul className="mt-3 divide-y divide-ink-900/10">
                {data.data.squads.map((s) => (
                  <li key={s.id} className="py-3">
                    <p className="font-semibold text-ink-900">{s.name}</p>
                    <p className="text-sm break-all text-ink-600">
                      Owner: {s.owner.name} ({s.owner.email})
                    </p>
                    <p className="text-sm text-ink-500">
                      {s.members} {s.members === 1 ? "player" : "players"} · created {formatDate(s.createdAt)}
                    </p>
                  </li>
                ))}
              </ul>
            )}
          </Card>
          <Card>
            <CardTitle as="h2">Ladders ({data.data.ladders.length})</CardTitle>
            {data.data.ladders.length === 0 ? (
              <EmptyState title="No ladders yet">Coaches build ladders from their Ladders page.</EmptyState>
            ) : (
              <ul className="mt-3 divide-y divide-ink-900/10">
                {data.data.ladders.map((l) => (
                  <li key={l.id} className="py-3">
                    <p className="font-semibold text-ink-900">{l.name}</p>
                    <p className="text-sm break-all text-ink-600">
                      Owner: {l.owner.name} ({l.owner.email})
                    </p>
                    <p className="text-sm text-ink-500">
                      {l.rungs} rungs · created {formatDate(l.createdAt)}
                    </p>
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </div>
      )}
    </>
  );
}
