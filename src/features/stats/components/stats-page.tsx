import { useMemo, type ReactNode } from "react";
import { useSearchParams } from "react-router";
import { ButtonLink, Card, CardTitle, EmptyState, InputField, PageHeader, SelectField } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useUnits } from "../../auth/hooks/use-units";
import { bandsParam } from "../utils/bands";
import { addDays, statsView } from "../utils/stats-query";
import { BandEditor } from "./band-editor";
import { CompareSection } from "./compare-section";
import { MakeRatesSection } from "./make-rates-section";
import { MissesSection } from "./misses-section";
import { RoundsSection } from "./rounds-section";
import { SessionPuttsSection } from "./session-putts-section";
import { SessionsSection } from "./sessions-section";
import { TrendSection } from "./trend-section";

function today(): string {
  const n = new Date();
  return `${n.getFullYear()}-${String(n.getMonth() + 1).padStart(2, "0")}-${String(n.getDate()).padStart(2, "0")}`;
}

function Section({ id, title, intro, children }: { id: string; title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <Card>
      <section aria-labelledby={id} className="flex flex-col gap-4">
        <div>
          <CardTitle as="h2">
            <span id={id}>{title}</span>
          </CardTitle>
          {intro ? <p className="mt-1 text-ink-500">{intro}</p> : null}
        </div>
        {children}
      </section>
    </Card>
  );
}

const PERIODS = [
  { id: "all", label: "All time", days: null },
  { id: "4w", label: "4 weeks", days: 28 },
  { id: "12w", label: "12 weeks", days: 84 },
  { id: "1y", label: "1 year", days: 365 },
] as const;

/** Make rates: by distance band against the tour, over time, between two periods, and per session. */
export function StatsPage() {
  return (
    <div className="flex flex-col gap-6">
      <title>Make rates · Borrowline</title>
      <PageHeader
        eyebrow="Practice log"
        title="Make rates"
        description="How often you hole out from each distance, how sure that number is, and whether it is moving."
      />
      <StatsBody />
    </div>
  );
}

/**
 * The figures of one player: the signed-in one, or (for their coach or an admin) `player`. Every request
 * carries the player's id; the server decides whether the viewer may read it (server/lib/player-access.ts).
 */
export function StatsBody({ player }: { player?: { id: string; name: string } }) {
  const { units } = useUnits();
  const [query, setQuery] = useSearchParams();
  const day = today();
  const raw = useMemo(() => statsView(new URLSearchParams(query.toString()), day), [query, day]);
  const view = useMemo(() => {
    if (!player) return raw;
    const playerId = player.id;
    return { ...raw, stats: { ...raw.stats, playerId }, trend: { ...raw.trend, playerId }, compare: { ...raw.compare, playerId } };
  }, [raw, player]);
  const range = {
    ...(view.stats.from ? { from: view.stats.from } : {}),
    ...(view.stats.to ? { to: view.stats.to } : {}),
    ...(player ? { playerId: player.id } : {}),
  };
  const who = player ? player.name : "You";
  const update = (changes: Record<string, string | undefined>) => {
    const next = new URLSearchParams(query);
    for (const [k, v] of Object.entries(changes)) {
      if (v === undefined || v === "") next.delete(k);
      else next.set(k, v);
    }
    setQuery(next, { replace: true, preventScrollReset: true });
  };
  const periodId =
    !view.stats.from && !view.stats.to
      ? "all"
      : PERIODS.find((p) => p.days !== null && view.stats.to === undefined && view.stats.from === addDays(day, -(p.days - 1)))?.id;

  const empty = player ? (
    <EmptyState title={view.stats.from || view.stats.to ? "No putts in this period" : `${player.name} has not logged any putts yet`}>
      {view.stats.from || view.stats.to
        ? "Choose a longer period."
        : "Their make rates appear here once they log a practice session or import one."}
    </EmptyState>
  ) : (
    <EmptyState
      title={view.stats.from || view.stats.to ? "No putts in this period" : "Log a session to see your make rates"}
      action={
        <div className="flex flex-wrap justify-center gap-2">
          <ButtonLink to={paths.practice.href()} variant="accent">
            Start a practice session
          </ButtonLink>
          <ButtonLink to={paths.practiceImport.href()} variant="secondary">
            Import a CSV
          </ButtonLink>
        </div>
      }
    >
      {view.stats.from || view.stats.to
        ? "Choose a longer period, or log some putts."
        : "On the practice green, set the distance and tap Holed or Missed after each putt. Your make rate for each distance, with how sure it is, appears here."}
    </EmptyState>
  );

  return (
    <div className="flex flex-col gap-6">
      <Card padded={false} className="p-4 sm:p-5">
        <div className="grid grid-cols-2 gap-3 lg:grid-cols-[auto_1fr_1fr_14rem] lg:items-end lg:gap-4">
          <fieldset className="col-span-2 lg:col-span-1">
            <legend className="mb-2 text-sm font-medium text-ink-800">Period</legend>
            <div className="grid grid-cols-4 gap-1 rounded-xl bg-ink-900/5 p-1">
              {PERIODS.map((p) => (
                <button
                  key={p.id}
                  type="button"
                  aria-pressed={periodId === p.id}
                  onClick={() => update({ from: p.days === null ? undefined : addDays(day, -(p.days - 1)), to: undefined })}
                  className={
                    periodId === p.id
                      ? "min-h-11 rounded-lg bg-white px-2 text-sm font-medium whitespace-nowrap shadow-sm"
                      : "min-h-11 rounded-lg px-2 text-sm font-medium whitespace-nowrap text-ink-600 hover:text-ink-900"
                  }
                >
                  {p.label}
                </button>
              ))}
            </div>
          </fieldset>
          <InputField
            label="From"
            type="date"
            value={view.stats.from ?? ""}
            max={view.stats.to}
            onChange={(e) => update({ from: e.target.value || undefined })}
          />
          <InputField
            label="To"
            type="date"
            value={view.stats.to ?? ""}
            min={view.stats.from}
            onChange={(e) => update({ to: e.target.value || undefined })}
          />
          <SelectField
            containerClassName="col-span-2 lg:col-span-1"
            label="Putts from"
            value={view.stats.source}
            options={[
              { value: "practice", label: "Practice sessions" },
              { value: "rounds", label: "Rounds (first putts)" },
              { value: "all", label: "Both" },
            ]}
            onChange={(e) => update({ src: e.target.value === "practice" ? undefined : e.target.value })}
          />
        </div>
        <details className="mt-3">
          <summary className="flex min-h-11 cursor-pointer items-center text-sm font-medium text-ink-700">
            Distance bands{view.edgesM ? " (your own)" : " (the defaults)"}
          </summary>
          <div className="mt-2 max-w-xl">
            <BandEditor
              key={`${units}-${bandsParam(view.edgesM) ?? "default"}`}
              units={units}
              edgesM={view.edgesM}
              onChange={(e) => update({ bands: bandsParam(e), tb: undefined })}
            />
          </div>
        </details>
      </Card>

      <Section id="by-distance" title="Make rate by distance">
        <MakeRatesSection
          params={view.stats}
          units={units}
          empty={empty}
          {...(player ? { rateLabel: `${player.name}’s make rate` } : {})}
        />
      </Section>

      <Section
        id="misses"
        title="Where the strokes go"
        intro="Strokes gained or lost against the tour from each distance, and which way the misses finish."
      >
        <MissesSection params={{ ...range, ...(view.stats.bands ? { bands: view.stats.bands } : {}) }} units={units} name={who} />
      </Section>

      <Section
        id="trend"
        title="Over time"
        intro={player ? "The make rate per band, week by week." : "Your make rate per band, week by week."}
      >
        <TrendSection
          params={view.trend}
          units={units}
          chosen={view.trendBands}
          onChoose={(b) => update({ tb: b.join(",") })}
          onWindow={(w, weeks) =>
            update({
              win: w === "rolling" ? "rolling" : undefined,
              ww: w === "rolling" && weeks && weeks !== 4 ? String(weeks) : undefined,
            })
          }
        />
      </Section>

      <Section
        id="compare"
        title="Compare two periods"
        intro="Is the practice paying off? Set an earlier period A against a later period B."
      >
        <CompareSection
          params={view.compare}
          units={units}
          onChange={(p) => update({ aFrom: p.aFrom, aTo: p.aTo, bFrom: p.bFrom, bTo: p.bTo })}
        />
      </Section>

      <Section
        id="sessions"
        title="Strokes gained per session"
        intro="Each session’s putts against what a tour player would take from the same distances."
      >
        <SessionsSection from={view.stats.from} to={view.stats.to} units={units} {...(player ? { playerId: player.id } : {})} />
      </Section>

      {player ? (
        <Section
          id="session-putts"
          title="Sessions and putts"
          intro={`${player.name}’s sessions, newest first. Open one to see its putts.`}
        >
          <SessionPuttsSection playerId={player.id} from={view.stats.from} to={view.stats.to} units={units} />
        </Section>
      ) : null}

      <Section
        id="rounds"
        title="Strokes gained per round"
        intro="On the course: putts taken against the tour’s expected putts from each first putt."
      >
        <RoundsSection params={range} />
      </Section>
    </div>
  );
}
