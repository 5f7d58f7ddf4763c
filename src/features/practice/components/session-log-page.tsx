import { formatDate, stimpText } from "#shared/format";
import { useEffect, useMemo, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import clsx from "clsx";
import type { BreakType } from "#shared/schemas/putts";
import { formatLength, fromLongUnit, parseDecimal, type UnitSystem } from "#shared/units";
import { Alert, Button, ButtonLink, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { errorMessage } from "../../../lib/query-client";
import { dismissFailedPutts, undoQueuedPutt, useAddPutt, useFailedPutts, usePuttQueue, watchSession } from "../api/add-putt";
import { useDeletePutt } from "../api/delete-putt";
import { useSession } from "../api/get-session";
import { useSessionPutts } from "../api/get-session-putts";
import { useOnline } from "../hooks/use-online";
import { useUnits } from "../../auth/hooks/use-units";
import { newClientId } from "../utils/client-id";
import { DEFAULT_DISTANCE } from "../utils/distances";
import { percent, puttLine, tally, waitingText } from "../utils/putt-text";
import { listedPutts, type ListedPutt } from "../utils/session-list";
import { PuttEntry, type PuttDraft } from "./putt-entry";

const LAST_DISTANCE_KEY = "borrowline.last-distance-m";

function readLastDistance(units: UnitSystem): number {
  try {
    const v = parseDecimal(window.localStorage.getItem(LAST_DISTANCE_KEY));
    if (v !== null && v >= 0.1 && v <= 60) return v;
  } catch {
    // no storage
  }
  return fromLongUnit(DEFAULT_DISTANCE[units], units);
}

function rememberDistance(m: number) {
  try {
    window.localStorage.setItem(LAST_DISTANCE_KEY, String(m));
  } catch {
    // no storage: the distance still stays for this page
  }
}

function SavedMark({ putt }: { putt: ListedPutt }) {
  if (putt.saved === "yes") return null;
  return (
    <span
      className={clsx(
        "rounded-full px-2 py-0.5 text-xs font-medium",
        putt.saved === "waiting" ? "bg-warn-50 text-warn-800" : "bg-ink-50 text-ink-600",
      )}
    >
      {putt.saved === "waiting" ? "waiting to be saved" : "saving…"}
    </span>
  );
}

function OutboxNotice({ waiting, online }: { waiting: number; online: boolean }) {
  if (waiting === 0 && online) return null;
  if (!online) {
    return (
      <Alert tone="warning" title="You are offline">
        {waiting > 0 ? `${waitingText(waiting)}. ` : ""}Keep logging: putts are kept on this phone and sent when the connection comes back.
      </Alert>
    );
  }
  return <Alert tone="info">{waitingText(waiting)} — sending now.</Alert>;
}

/** Logging on the green: each putt is saved at once (optimistically), queued while offline, and can be undone. */
export function SessionLogPage({ sessionId }: { sessionId: string }) {
  const { units } = useUnits();
  const queryClient = useQueryClient();
  const session = useSession(sessionId);
  const stored = useSessionPutts(sessionId);
  const queue = usePuttQueue();
  const failed = useFailedPutts(sessionId);
  const addPutt = useAddPutt(sessionId);
  const deletePutt = useDeletePutt();
  const online = useOnline();

  const [distanceM, setDistanceM] = useState(() => readLastDistance(units));
  const [breakType, setBreakType] = useState<BreakType | null>(null);
  const [announcement, setAnnouncement] = useState("");

  useEffect(() => watchSession(sessionId), [sessionId]);

  const putts = useMemo(
    () => listedPutts(stored.data?.items ?? [], queue, sessionId, session.data?.date),
    [stored.data, queue, sessionId, session.data?.date],
  );
  const t = tally(putts);
  const waiting = queue.length;
  const last = putts[putts.length - 1];

  const changeDistance = (m: number) => {
    setDistanceM(m);
    rememberDistance(m);
  };

  const log = (draft: PuttDraft) => {
    addPutt.mutate({
      sessionId,
      clientId: newClientId(),
      distanceM: draft.distanceM,
      holed: draft.holed,
      missSide: draft.holed ? null : draft.missSide,
      missLengthM: draft.holed ? null : draft.missLengthM,
      breakType: draft.breakType,
      loggedAt: new Date().toISOString(),
    });
    const next = tally([...putts, { holed: draft.holed }]);
    setAnnouncement(
      `${draft.holed ? "Holed" : "Missed"} from ${formatLength(draft.distanceM, units)}. ${next.holed} of ${next.putts} holed.`,
    );
  };

  const undo = () => {
    if (!last) return;
    const words = `Took back the ${formatLength(last.distanceM, units)} putt.`;
    if (last.clientId && undoQueuedPutt(queryClient, last.clientId)) {
      setAnnouncement(words);
      return;
    }
    if (last.id.startsWith("pending:")) return;
    deletePutt.mutate({ id: last.id, sessionId });
    setAnnouncement(words);
  };

  if (session.isPending) return <PageSpinner label="Opening the session" />;
  if (session.isError) {
    return (
      <Alert
        tone="error"
        title="Could not open this session"
        action={
          <ButtonLink to={paths.practice.href()} size="sm" variant="secondary">
            All sessions
          </ButtonLink>
        }
      >
        {errorMessage(session.error)}
      </Alert>
    );
  }
  const s = session.data;
  const details = [s.greenName, s.stimpFt !== null ? stimpText(s.stimpFt) : null, s.conditions, ...s.tags].filter(Boolean).join(" · ");

  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4" data-putt-log={sessionId}>
      <title>{`Logging · ${formatDate(s.date, "weekday")} · Borrowline`}</title>
      <header className="flex items-start justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm font-semibold tracking-wide text-coral-700 uppercase">Logging putts</p>
          <h1 className="text-2xl font-semibold tracking-tight">{formatDate(s.date, "weekday")}</h1>
          {details ? <p className="truncate text-sm text-ink-500">{details}</p> : null}
        </div>
        <ButtonLink to={paths.practice.href()} variant="secondary" size="sm" className="shrink-0">
          Done
        </ButtonLink>
      </header>

      <dl
        aria-label="This session so far"
        className="grid grid-cols-3 divide-x divide-sand-50/15 rounded-2xl bg-ink-900 py-3 text-center text-sand-50"
      >
        <div>
          <dt className="text-xs tracking-wide text-sand-200 uppercase">Putts</dt>
          <dd className="text-3xl font-semibold tabular-nums">{t.putts}</dd>
        </div>
        <div>
          <dt className="text-xs tracking-wide text-sand-200 uppercase">Holed</dt>
          <dd className="text-3xl font-semibold tabular-nums">{t.holed}</dd>
        </div>
        <div>
          <dt className="text-xs tracking-wide text-sand-200 uppercase">Make rate</dt>
          <dd className="text-3xl font-semibold tabular-nums">{percent(t.rate)}</dd>
        </div>
      </dl>

      <OutboxNotice waiting={waiting} online={online} />
      {failed.length > 0 ? (
        <Alert
          tone="error"
          title={failed.length === 1 ? "A putt was not saved" : `${failed.length} putts were not saved`}
          action={
            <Button size="sm" variant="ghost" onClick={() => dismissFailedPutts(queryClient, sessionId)}>
              Dismiss
            </Button>
          }
        >
          {`The ${formatLength(failed[failed.length - 1]!.putt.distanceM, units)} putt was taken off the list: ${errorMessage(failed[failed.length - 1]!.error)}`}
        </Alert>
      ) : null}
      {stored.isError ? (
        <Alert tone="error" title="Could not load this session's putts">
          {errorMessage(stored.error)}
        </Alert>
      ) : null}

      <p aria-live="polite" className="sr-only">
        {announcement}
      </p>

      <PuttEntry
        units={units}
        distanceM={distanceM}
        onDistanceChange={changeDistance}
        breakType={breakType}
        onBreakTypeChange={setBreakType}
        onLog={log}
      />

      <Button
        variant="secondary"
        size="lg"
        fullWidth
        onClick={undo}
        aria-disabled={!last || undefined}
        pending={deletePutt.isPending}
        className="min-h-14"
      >
        Undo last putt
      </Button>

      <section aria-labelledby="session-putts" className="flex flex-col gap-2">
        <h2 id="session-putts" className="text-lg font-semibold tracking-tight">
          Putts this session
        </h2>
        {stored.isPending && putts.length === 0 ? <PageSpinner label="Loading putts" /> : null}
        {!stored.isPending && putts.length === 0 ? (
          <p className="text-ink-500">No putts yet. Set the distance, then tap Holed or Missed after each putt.</p>
        ) : null}
        <ol className="flex flex-col gap-1.5" aria-label="Putts, newest first">
          {putts
            .map((p, i) => ({ p, n: i + 1 }))
            .reverse()
            .map(({ p, n }) => (
              <li key={p.clientId ?? p.id} className="flex items-center gap-3 rounded-xl bg-white px-3 py-2.5 ring-1 ring-ink-900/5">
                <span className="w-7 shrink-0 text-right text-sm text-ink-400 tabular-nums">{n}</span>
                <span aria-hidden="true" className={clsx("size-2.5 shrink-0 rounded-full", p.holed ? "bg-ok-600" : "bg-ink-300")} />
                <span className="min-w-0 flex-1">{puttLine(p, units)}</span>
                <SavedMark putt={p} />
              </li>
            ))}
        </ol>
      </section>
    </div>
  );
}
