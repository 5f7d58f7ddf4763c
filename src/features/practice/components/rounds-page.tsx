import { formatDate } from "#shared/format";
import { useState } from "react";
import { Link, useNavigate } from "react-router";
import { Alert, Button, Card, CardTitle, EmptyState, InputField, PageHeader, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useCreateRound } from "../api/create-round";
import { ROUNDS_PAGE_SIZE, useRounds } from "../api/get-rounds";
import { todayIso } from "../utils/dates";
import { formatStrokesGained } from "../utils/hole-entry";

function NewRoundForm() {
  const create = useCreateRound();
  const navigate = useNavigate();
  const [date, setDate] = useState(todayIso());
  const [course, setCourse] = useState("");
  const fields = isApiError(create.error) ? create.error.fields : {};
  return (
    <Card>
      <CardTitle>Start a round</CardTitle>
      <form
        noValidate
        aria-label="Start a round"
        className="mt-4 grid items-start gap-4 sm:grid-cols-[12rem_1fr_auto]"
        onSubmit={(e) => {
          e.preventDefault();
          create.mutate({ date, course: course.trim() || null, holes: [] }, { onSuccess: (r) => void navigate(paths.round.href(r.id)) });
        }}
      >
        <InputField label="Day" type="date" value={date} onChange={(e) => setDate(e.target.value)} error={fields.date} />
        <InputField
          label="Course (optional)"
          value={course}
          onChange={(e) => setCourse(e.target.value)}
          placeholder="e.g. Larkspur Heath"
          error={fields.course}
        />
        <Button type="submit" variant="accent" size="lg" loading={create.isPending} loadingText="Starting…" className="sm:mt-6">
          Start the round
        </Button>
      </form>
      {create.isError && Object.keys(fields).length === 0 ? (
        <Alert tone="error" className="mt-3">
          {errorMessage(create.error)}
        </Alert>
      ) : null}
    </Card>
  );
}

/** Rounds on the course: putts per hole, three-putts and strokes gained putting. */
export function RoundsPage() {
  const [page, setPage] = useState(1);
  const rounds = useRounds(page);
  const total = rounds.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / ROUNDS_PAGE_SIZE));
  return (
    <div className="flex flex-col gap-6">
      <title>Rounds · Borrowline</title>
      <PageHeader
        eyebrow="Practice log"
        title="Rounds"
        description="On the course, note each hole’s first putt and how many putts it took. Strokes gained compares every hole with the tour average from that distance."
      />
      <NewRoundForm />
      {rounds.isPending ? <PageSpinner label="Loading your rounds" /> : null}
      {rounds.isError ? (
        <Alert tone="error" title="Could not load your rounds">
          {errorMessage(rounds.error)}
        </Alert>
      ) : null}
      {rounds.data && rounds.data.items.length === 0 ? (
        <EmptyState title="No rounds yet">Start one before you tee off; each hole takes two or three taps.</EmptyState>
      ) : null}
      {rounds.data && rounds.data.items.length > 0 ? (
        <section aria-labelledby="rounds-heading" className="flex flex-col gap-3">
          <h2 id="rounds-heading" className="text-xl font-semibold tracking-tight">
            Your rounds
          </h2>
          <ul className="flex flex-col gap-2">
            {rounds.data.items.map((r) => (
              <li key={r.id}>
                <Link
                  to={paths.round.href(r.id)}
                  className="flex min-h-16 flex-wrap items-center justify-between gap-x-4 gap-y-1 rounded-xl bg-white px-4 py-3 ring-1 ring-ink-900/5 hover:ring-ink-900/20 focus-visible:outline-3 focus-visible:outline-coral-500"
                >
                  <span className="min-w-0">
                    <span className="block font-semibold">{formatDate(r.date, "weekday")}</span>
                    <span className="block text-sm text-ink-500">{r.course ?? "Course not named"}</span>
                  </span>
                  <span className="flex gap-4 text-sm text-ink-700 tabular-nums">
                    <span>{r.totals.holes} holes</span>
                    <span>{r.totals.putts} putts</span>
                    <span>{r.totals.threePutts} three-putts</span>
                    <span className="font-semibold">SG {r.totals.holes > 0 ? formatStrokesGained(r.totals.strokesGained) : "–"}</span>
                  </span>
                </Link>
              </li>
            ))}
          </ul>
          {pages > 1 ? (
            <div className="flex items-center justify-between text-sm text-ink-600">
              <span>
                Page {page} of {pages}
              </span>
              <div className="flex gap-2">
                <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>
                  Previous
                </Button>
                <Button size="sm" variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
                  Next
                </Button>
              </div>
            </div>
          ) : null}
        </section>
      ) : null}
    </div>
  );
}
