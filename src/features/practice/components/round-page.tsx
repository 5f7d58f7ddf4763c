import { formatDate } from "#shared/format";
import { useState } from "react";
import { useNavigate } from "react-router";
import clsx from "clsx";
import type { Round, RoundHole } from "#shared/schemas/rounds";
import { formatLength } from "#shared/units";
import { Alert, Button, ButtonLink, ConfirmDialog, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { errorMessage } from "../../../lib/query-client";
import { useDeleteRound } from "../api/delete-round";
import { useRound } from "../api/get-round";
import { useUnits } from "../../auth/hooks/use-units";
import { formatStrokesGained, HOLES, nextHole } from "../utils/hole-entry";
import { HoleEntry } from "./hole-entry";

function Totals({ round }: { round: Round }) {
  const t = round.totals;
  const items = [
    { label: "Holes", value: String(t.holes) },
    { label: "Putts", value: String(t.putts) },
    { label: "Three-putts", value: String(t.threePutts) },
    { label: "Strokes gained", value: t.holes > 0 ? formatStrokesGained(t.strokesGained) : "–" },
  ];
  return (
    <div>
      <dl
        aria-label="Round totals"
        className="grid grid-cols-4 divide-x divide-sand-50/15 rounded-2xl bg-ink-900 py-3 text-center text-sand-50"
      >
        {items.map((i) => (
          <div key={i.label} className="px-1">
            <dt className="text-[0.7rem] leading-tight tracking-wide text-sand-200 uppercase">{i.label}</dt>
            <dd className="text-2xl font-semibold tabular-nums sm:text-3xl">{i.value}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-1.5 text-xs text-ink-500">
        Strokes gained putting: the tour’s average putts from each first-putt distance minus your putts (M. Broadie, 2012); above 0 is
        better than a tour player.
        {t.longFirstPutts > 0
          ? ` Long first putts (6 m or more): ${t.longFirstPutts}, of them left outside 1 m: ${t.longLagsOutside1m}.`
          : ""}
      </p>
    </div>
  );
}

function HolePicker({ holes, current, onPick }: { holes: RoundHole[]; current: number; onPick: (n: number) => void }) {
  const byNumber = new Map(holes.map((h) => [h.holeNumber, h]));
  return (
    <nav aria-label="Holes" className="grid grid-cols-9 gap-1.5">
      {HOLES.map((n) => {
        const h = byNumber.get(n);
        return (
          <button
            key={n}
            type="button"
            aria-current={n === current ? "step" : undefined}
            aria-label={h ? `Hole ${n}: ${h.putts} ${h.putts === 1 ? "putt" : "putts"}` : `Hole ${n}: not entered`}
            onClick={() => onPick(n)}
            className={clsx(
              "flex min-h-12 flex-col items-center justify-center rounded-lg border-2 text-sm leading-none font-semibold tabular-nums",
              n === current
                ? "border-coral-500 bg-white"
                : h
                  ? "border-transparent bg-ink-900 text-sand-50"
                  : "border-ink-900/10 bg-white/60 text-ink-500",
            )}
          >
            <span>{n}</span>
            {h ? (
              <span className={clsx("mt-0.5 text-[0.7rem] font-normal", n === current ? "text-ink-500" : "text-sand-200")}>{h.putts}</span>
            ) : null}
          </button>
        );
      })}
    </nav>
  );
}

export function RoundPage({ roundId }: { roundId: string }) {
  const { units } = useUnits();
  const round = useRound(roundId);
  const remove = useDeleteRound();
  const navigate = useNavigate();
  const [current, setCurrent] = useState<number | null>(null);
  const [confirm, setConfirm] = useState(false);

  if (round.isPending) return <PageSpinner label="Opening the round" />;
  if (round.isError) {
    return (
      <Alert
        tone="error"
        title="Could not open this round"
        action={
          <ButtonLink to={paths.rounds.href()} size="sm" variant="secondary">
            All rounds
          </ButtonLink>
        }
      >
        {errorMessage(round.error)}
      </Alert>
    );
  }
  const r = round.data;
  const hole = current ?? nextHole(r.holes);
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-5">
      <title>{`Round · ${formatDate(r.date, "weekday")} · Borrowline`}</title>
      <header className="flex items-start justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm font-semibold tracking-wide text-coral-700 uppercase">Round</p>
          <h1 className="text-2xl font-semibold tracking-tight">{r.course ?? "Round"}</h1>
          <p className="text-sm text-ink-500">{formatDate(r.date, "weekday")}</p>
        </div>
        <ButtonLink to={paths.rounds.href()} variant="secondary" size="sm" className="shrink-0">
          Done
        </ButtonLink>
      </header>
      <Totals round={r} />
      <HolePicker holes={r.holes} current={hole} onPick={setCurrent} />
      <HoleEntry key={`${hole}`} round={r} holeNumber={hole} units={units} onSaved={(n) => setCurrent(n < 18 ? n + 1 : 18)} />
      {r.holes.length > 0 ? (
        <details className="rounded-xl bg-white/60 px-4 py-1 ring-1 ring-ink-900/5 open:pb-3">
          <summary className="flex min-h-12 cursor-pointer items-center font-medium">Hole by hole</summary>
          <table className="w-full text-sm">
            <thead className="text-left text-ink-500">
              <tr>
                <th scope="col" className="py-1">
                  Hole
                </th>
                <th scope="col" className="py-1">
                  First putt
                </th>
                <th scope="col" className="py-1 text-right">
                  Putts
                </th>
                <th scope="col" className="py-1 text-right">
                  SG
                </th>
              </tr>
            </thead>
            <tbody>
              {r.holes.map((h) => (
                <tr key={h.holeNumber} className="border-t border-ink-900/5">
                  <td className="py-1.5">{h.holeNumber}</td>
                  <td className="py-1.5">
                    {h.firstPuttM !== null ? formatLength(h.firstPuttM, units) : "off the green"}
                    {h.leftAfterFirstM ? <span className="text-ink-500"> · left {formatLength(h.leftAfterFirstM, units)}</span> : null}
                  </td>
                  <td className="py-1.5 text-right tabular-nums">{h.putts}</td>
                  <td className="py-1.5 text-right tabular-nums">
                    {h.strokesGained === null ? "–" : formatStrokesGained(h.strokesGained)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      ) : null}
      <Button variant="ghost" size="sm" className="self-start text-bad-600" onClick={() => setConfirm(true)}>
        Delete this round
      </Button>
      <ConfirmDialog
        open={confirm}
        title="Delete this round?"
        confirmLabel="Delete round"
        busy={remove.isPending}
        onCancel={() => setConfirm(false)}
        onConfirm={() => remove.mutate(r.id, { onSuccess: () => void navigate(paths.rounds.href()), onSettled: () => setConfirm(false) })}
      >
        {`${formatDate(r.date, "weekday")}${r.course ? ` at ${r.course}` : ""}, ${r.totals.holes} holes entered.`}
      </ConfirmDialog>
    </div>
  );
}
