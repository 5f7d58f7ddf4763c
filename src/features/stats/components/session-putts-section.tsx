import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import type { Putt } from "#shared/schemas/putts";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";
import { Alert, Button } from "../../../components/ui";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { statsKeys } from "../api/keys";
import type { SessionStat } from "../api/types";
import { useSessionStats } from "../api/get-session-stats";
import { weekLabel } from "../utils/chart-data";

function puttWords(p: Putt, units: UnitSystem): string {
  if (p.holed) return "holed";
  const side = p.missSide ? `missed ${p.missSide}` : "missed";
  if (p.missLengthM === null) return side;
  return `${side}, ${formatShort(Math.abs(p.missLengthM), units)} ${p.missLengthM < 0 ? "short" : "past"}`;
}

function SessionPutts({ session, units }: { session: SessionStat; units: UnitSystem }) {
  const putts = useQuery({
    queryKey: [...statsKeys.all, "session-putts", session.sessionId],
    queryFn: ({ signal }) => api.get<{ items: Putt[] }>(apiPaths.sessionPutts(session.sessionId), { signal }),
  });
  if (putts.isPending) return <p className="py-2 text-ink-500">Loading putts…</p>;
  if (putts.isError) return <Alert tone="error">{errorMessage(putts.error)}</Alert>;
  if (putts.data.items.length === 0) return <p className="py-2 text-ink-500">No putts in this session.</p>;
  return (
    <ol className="grid gap-x-6 gap-y-1 py-2 text-sm text-ink-700 sm:grid-cols-2">
      {putts.data.items.map((p, i) => (
        <li key={p.id} className="flex gap-2">
          <span className="w-6 text-right text-ink-400 tabular-nums">{i + 1}.</span>
          <span className="tabular-nums">{formatLength(p.distanceM, units)}</span>
          <span className={p.holed ? "text-ok-600" : "text-ink-600"}>{puttWords(p, units)}</span>
          {p.breakType ? <span className="text-ink-400">{p.breakType.replace(/-/g, " ")}</span> : null}
        </li>
      ))}
    </ol>
  );
}

/** A player's sessions, newest first, each opening onto its putts (read-only). */
export function SessionPuttsSection({ playerId, from, to, units }: { playerId?: string; from?: string; to?: string; units: UnitSystem }) {
  const [shown, setShown] = useState(10);
  const stats = useSessionStats({ ...(from ? { from } : {}), ...(to ? { to } : {}), ...(playerId ? { playerId } : {}), pageSize: 50 });
  if (stats.isError)
    return (
      <Alert tone="error" title="Could not load the sessions">
        {errorMessage(stats.error)}
      </Alert>
    );
  if (!stats.data) return <div className="h-32 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the sessions" />;
  const items = stats.data.items;
  if (items.length === 0) return <p className="text-ink-500">No sessions in this period.</p>;
  return (
    <div className="flex flex-col gap-2">
      <ul className="flex flex-col divide-y divide-ink-900/10 rounded-xl bg-white ring-1 ring-ink-900/10">
        {items.slice(0, shown).map((s) => (
          <li key={s.sessionId} className="px-4">
            <details>
              <summary className="flex min-h-11 cursor-pointer flex-wrap items-center gap-x-3 py-2">
                <span className="font-medium">{weekLabel(s.date)}</span>
                <span className="text-sm text-ink-500">{s.greenName ?? "No green"}</span>
                <span className="ml-auto text-sm text-ink-600 tabular-nums">
                  {s.holed} of {s.putts} holed
                </span>
              </summary>
              <SessionPutts session={s} units={units} />
            </details>
          </li>
        ))}
      </ul>
      {items.length > shown ? (
        <div>
          <Button size="sm" variant="secondary" onClick={() => setShown((n) => n + 10)}>
            Show ten more sessions
          </Button>
        </div>
      ) : null}
    </div>
  );
}
