import { formatDate } from "#shared/format";
import { useState } from "react";
import { Alert, Button, ButtonLink, EmptyState, Spinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import type { UnitSystem } from "#shared/units";
import { useDeleteRead } from "../api/delete-read";
import type { SavedRead } from "#shared/schemas/reads";
import { useSavedReads } from "../api/get-saved-reads";
import { aimWords, readInputSummary } from "../utils/answer-text";
import { describeFallLine } from "../utils/directions";
import { encodeReadQuery, fromReadRequest } from "../../../lib/read-url";

function SavedReadItem({ item, units }: { item: SavedRead; units: UnitSystem }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteRead();
  const summary = readInputSummary(
    item.input.distanceM,
    item.input.slopePct,
    describeFallLine(item.input.fallLineDeg),
    item.input.stimpFt,
    units,
  );
  const aim = aimWords(item.result.aimOffsetM, item.result.startLineDeg, units);
  const href = paths.read.href(encodeReadQuery(fromReadRequest(item.input, units)));
  const title = item.label || summary;

  return (
    <li className="flex flex-col gap-3 rounded-xl bg-white/70 px-4 py-3 ring-1 ring-ink-900/5 sm:flex-row sm:items-center sm:justify-between">
      <div className="min-w-0">
        <p className="font-semibold text-ink-900">{title}</p>
        {item.label ? <p className="text-sm text-ink-600">{summary}</p> : null}
        <p className="text-sm text-ink-600">{aim.headline}</p>
        <p className="text-xs text-ink-500">
          {item.greenName ? `${item.greenName} · ` : ""}
          {formatDate(item.createdAt)}
        </p>
      </div>
      <div className="flex shrink-0 flex-wrap gap-2">
        {confirming ? (
          <>
            <Button
              size="sm"
              variant="danger"
              loading={remove.isPending}
              loadingText="Deleting…"
              onClick={() => remove.mutate(item.id)}
              aria-label={`Yes, delete ${title}`}
            >
              Yes, delete
            </Button>
            <Button size="sm" variant="ghost" onClick={() => setConfirming(false)}>
              Keep
            </Button>
          </>
        ) : (
          <>
            <ButtonLink size="sm" variant="secondary" to={href} aria-label={`Open ${title}`}>
              Open
            </ButtonLink>
            <Button size="sm" variant="ghost" onClick={() => setConfirming(true)} aria-label={`Delete ${title}`}>
              Delete
            </Button>
          </>
        )}
      </div>
    </li>
  );
}

/** The signed-in player's saved reads: open one (it loads into the form through its link) or delete it. */
export function SavedReadsList({ units }: { units: UnitSystem }) {
  const saved = useSavedReads();
  return (
    <section aria-labelledby="saved-reads-title" className="flex flex-col gap-4">
      <h2 id="saved-reads-title" className="text-lg font-semibold tracking-tight">
        Saved reads
      </h2>
      {saved.isPending ? <Spinner label="Loading your saved reads" /> : null}
      {saved.isError ? (
        <Alert
          tone="error"
          title="Could not load your saved reads"
          action={
            <Button size="sm" variant="secondary" onClick={() => void saved.refetch()}>
              Try again
            </Button>
          }
        >
          {saved.error.message}
        </Alert>
      ) : null}
      {saved.data && saved.data.items.length === 0 ? (
        <EmptyState title="No saved reads yet">Save a read above to keep it for the course or the practice green.</EmptyState>
      ) : null}
      {saved.data && saved.data.items.length > 0 ? (
        <ul className="flex flex-col gap-2">
          {saved.data.items.map((item) => (
            <SavedReadItem key={item.id} item={item} units={units} />
          ))}
        </ul>
      ) : null}
    </section>
  );
}
