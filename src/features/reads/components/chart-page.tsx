import { lazy, Suspense, useEffect, useLayoutEffect, useMemo, useRef } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useSearchParams } from "react-router";
import type { ChartRequest } from "#shared/schemas/reads";
import { Alert, Button, ButtonLink, Card, ErrorBoundary, InputField, PageHeader, PageSpinner, Spinner } from "../../../components/ui";
import { useBreakChart } from "../api/get-break-chart";
import { useUnits } from "../../auth/hooks/use-units";
import { CHART_DIRECTIONS_DEG, cannotStopCount, chartDistancesM } from "../utils/chart-data";
import { cannotStopWords } from "../utils/answer-text";
import {
  chartFormSchema,
  fieldLimits,
  fieldSi,
  formatNumber,
  FIELD_SPECS,
  type ChartFormValues,
  type ExactMemory,
} from "../utils/read-form";
import { formatSlope, formatSpeed, stimpText } from "#shared/format";
import { paths } from "../../../config/paths";
import { decodeReadQueryChecked, encodeReadQuery, isCompleteReadQuery, type ReadValues } from "../../../lib/read-url";
import { ringFallLineDegs, ringLengthsM } from "../utils/aim-ring";
import { AimRingPicture } from "./aim-ring-picture";
import { BreakChartTable } from "./break-chart-table";
import { UnitsSwitch } from "./units-switch";
import { usePrinting } from "../../../lib/use-printing";

// recharts is heavy: the graph is its own chunk, loaded after the table is on screen.
const BreakChartGraph = lazy(() => import("./break-chart-graph").then((m) => ({ default: m.BreakChartGraph })));

type ChartSettings = { slopePct: number; stimpFt: number; rollPastM: number };

function toText(s: ChartSettings, units: ReturnType<typeof useUnits>["units"]): { values: ChartFormValues; memory: ExactMemory } {
  const slope = formatNumber(s.slopePct, 1);
  const stimp = formatNumber(s.stimpFt, 1);
  const rollPast = formatNumber(FIELD_SPECS.rollPast.toUnit(s.rollPastM, units), 0);
  return {
    values: { slope, stimp, rollPast },
    memory: {
      slope: { text: slope, si: s.slopePct },
      stimp: { text: stimp, si: s.stimpFt },
      rollPast: { text: rollPast, si: s.rollPastM },
    },
  };
}

function ChartControls({
  settings,
  onApply,
  units,
  busy,
}: {
  settings: ChartSettings;
  onApply: (s: ChartSettings) => void;
  units: ReturnType<typeof useUnits>["units"];
  busy: boolean;
}) {
  const start = toText(settings, units);
  const memory = useRef<ExactMemory>(start.memory);
  const { register, handleSubmit, formState, reset } = useForm<ChartFormValues>({
    resolver: zodResolver(chartFormSchema(units)),
    defaultValues: start.values,
  });
  const key = `${settings.slopePct}|${settings.stimpFt}|${settings.rollPastM}|${units}`;
  const shown = useRef(key);
  useLayoutEffect(() => {
    if (shown.current === key) return;
    shown.current = key;
    const next = toText(settings, units);
    memory.current = next.memory;
    reset(next.values);
  }, [key, settings, units, reset]);

  const rp = fieldLimits("rollPast", units);
  return (
    <form
      noValidate
      aria-label="Chart settings"
      className="grid grid-cols-2 items-start gap-3 sm:grid-cols-[repeat(3,minmax(0,11rem))_auto] print:hidden"
      onSubmit={(event) => {
        const apply = (v: ChartFormValues) =>
          onApply({
            slopePct: fieldSi("slope", v.slope, units, memory.current),
            stimpFt: fieldSi("stimp", v.stimp, units, memory.current),
            rollPastM: fieldSi("rollPast", v.rollPast, units, memory.current),
          });
        void handleSubmit(apply)(event);
      }}
    >
      <InputField label="Slope (%)" inputMode="decimal" autoComplete="off" error={formState.errors.slope?.message} {...register("slope")} />
      <InputField
        label="Stimp (ft)"
        inputMode="decimal"
        autoComplete="off"
        error={formState.errors.stimp?.message}
        {...register("stimp")}
      />
      <InputField
        label={`Finish past (${rp.unit})`}
        inputMode="decimal"
        autoComplete="off"
        error={formState.errors.rollPast?.message}
        {...register("rollPast")}
      />
      <Button type="submit" loading={busy} loadingText="Working…" className="col-span-2 self-end sm:col-span-1 sm:mt-7">
        Show the chart
      </Button>
    </form>
  );
}

/** The pace after "Show the chart": the roll-past field wins, unless it still shows what an entry-speed read started with. */
function paceFrom(read: ReadValues, rollPastM: number): Pick<ReadValues, "paceMode" | "rollPastM"> {
  if (read.paceMode === "entrySpeed" && Math.abs(rollPastM - read.rollPastM) < 1e-9) return { paceMode: "entrySpeed", rollPastM };
  return { paceMode: "rollPast", rollPastM };
}

export function ChartPage() {
  const { units, setUnits, ready, saving } = useUnits();
  const printing = usePrinting();
  const [params, setParams] = useSearchParams();
  const query = params.toString();
  // The whole read travels in the address (the one read codec): the chart uses its slope, Stimp and pace, and keeps
  // its distance and fall line for the links back to the read and to rehearse.
  const { values: read, replaced } = useMemo(() => decodeReadQueryChecked(new URLSearchParams(query), units), [query, units]);
  const settings: ChartSettings = { slopePct: read.slopePct, stimpFt: read.stimpFt, rollPastM: read.rollPastM };
  const entryPace = read.paceMode === "entrySpeed";
  const request: ChartRequest | null = ready
    ? {
        slopePct: settings.slopePct,
        stimpFt: settings.stimpFt,
        pace: entryPace ? { entrySpeedMps: read.entrySpeedMps } : { rollPastM: settings.rollPastM },
        distances: chartDistancesM(units),
        fallLineDegs: [...CHART_DIRECTIONS_DEG],
      }
    : null;
  const chart = useBreakChart(request);
  // The picture asks for its own grid: five lengths, a ball from every 15° around the hole.
  const ringRequest: ChartRequest | null = request
    ? { ...request, distances: ringLengthsM(units), fallLineDegs: ringFallLineDegs() }
    : null;
  const rings = useBreakChart(ringRequest);

  // A bare or partial /chart gets the whole read written into the address, so it can be shared as it is.
  const encoded = encodeReadQuery(read);
  useEffect(() => {
    if (ready && (!isCompleteReadQuery(params) || replaced.length > 0)) setParams(encoded, { replace: true });
  }, [ready, params, replaced.length, encoded, setParams]);

  if (!ready) return <PageSpinner label="Getting the chart ready" />;

  const paceText = entryPace
    ? `reaching the hole at ${formatSpeed(read.entrySpeedMps, units)}`
    : settings.rollPastM < 0.01
      ? "at a dying pace (just reaching the hole)"
      : `finishing ${formatNumber(FIELD_SPECS.rollPast.toUnit(settings.rollPastM, units), 0)} ${fieldLimits("rollPast", units).unit} past`;
  const settingsWords = `Slope ${formatSlope(settings.slopePct)}, ${stimpText(settings.stimpFt)}, ${paceText}`;
  const caption = `Each number is how far left or right of the hole the start line passes, at the hole's distance. Rows: putt length; columns: which way the green falls as you stand behind the ball. ${settingsWords}. Assumes an even slope and a true roll.`;
  const answer = chart.data;

  return (
    <>
      <title>Break chart · Borrowline</title>
      <PageHeader
        eyebrow="Break chart"
        title="Where to aim, from every side of the hole"
        description="One slope, one green speed, one pace. The picture shows the aim spots of putts of several lengths coming from all round the hole; the numbers below it can be printed."
        actions={
          <div className="flex flex-wrap items-center gap-3 print:hidden">
            <UnitsSwitch value={units} onChange={setUnits} saving={saving} />
          </div>
        }
      />
      <Card className="mb-6 print:hidden">
        <ChartControls
          settings={settings}
          units={units}
          busy={chart.isFetching}
          onApply={(s) => setParams(encodeReadQuery({ ...read, slopePct: s.slopePct, stimpFt: s.stimpFt, ...paceFrom(read, s.rollPastM) }))}
        />
        {entryPace ? (
          <p className="mt-3 text-sm text-ink-600">
            The read gave its pace as an entry speed ({formatSpeed(read.entrySpeedMps, units)} at the hole); the chart uses it for every
            cell. Show the chart with a finish-past to change it.
          </p>
        ) : null}
        <div className="mt-4 flex flex-wrap gap-2 border-t border-ink-900/10 pt-4">
          <ButtonLink to={paths.read.href(encoded)} variant="secondary" size="sm">
            Back to the read
          </ButtonLink>
          <ButtonLink to={paths.rehearse.href(encoded)} variant="secondary" size="sm">
            Rehearse the read
          </ButtonLink>
        </div>
      </Card>

      {chart.isError ? (
        <Alert
          tone="error"
          title="Could not work out the chart"
          action={
            <Button size="sm" variant="secondary" onClick={() => void chart.refetch()}>
              Try again
            </Button>
          }
        >
          {chart.error.message}
        </Alert>
      ) : null}
      {chart.isPending && !chart.isError ? <PageSpinner label="Working out the chart" /> : null}

      {answer ? (
        <div className="flex flex-col gap-6" aria-busy={chart.isPlaceholderData || undefined}>
          {!answer.canStop ? (
            <Alert tone="warning" title="No ball stops on this green">
              {cannotStopWords(settings.slopePct, settings.stimpFt, answer.model?.maxStoppableSlopePct)}
            </Alert>
          ) : cannotStopCount(answer) > 0 ? (
            <Alert tone="info">Cells marked &ldquo;won&apos;t stop&rdquo; are putts where the ball would not come to rest.</Alert>
          ) : null}
          <Card className="print:hidden" aria-busy={rings.isPlaceholderData || undefined}>
            <h2 className="mb-3 text-lg font-semibold tracking-tight">Aim spots all round the hole</h2>
            {rings.isError ? (
              <Alert tone="error" title="Could not work out the picture">
                {rings.error.message} The numbers below still stand.
              </Alert>
            ) : rings.data ? (
              <AimRingPicture answer={rings.data} units={units} settingsWords={settingsWords} />
            ) : (
              <PageSpinner label="Working out the aim spots" />
            )}
            <p className="mt-3 text-sm text-ink-500">
              Assumes an even, planar slope and a true-rolling ball; grain, wind and the green&apos;s own contours move real aims.
            </p>
          </Card>
          <Card className="print:p-0 print:shadow-none print:ring-0">
            <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
              <h2 className="text-lg font-semibold tracking-tight">The same aims in numbers</h2>
              <Button variant="secondary" size="sm" className="print:hidden" onClick={() => window.print()}>
                Print the numbers
              </Button>
            </div>
            {chart.isPlaceholderData ? (
              <p className="mb-2 text-sm text-ink-500 print:hidden">
                <Spinner size="sm" label="" /> Updating…
              </p>
            ) : null}
            <BreakChartTable answer={answer} units={units} caption={caption} />
          </Card>
          <Card className="print:hidden">
            <h2 className="mb-4 text-lg font-semibold tracking-tight">Aim against distance</h2>
            <ErrorBoundary
              fallback={(_e, retry) => (
                <Alert
                  tone="error"
                  title="The graph could not be drawn"
                  action={
                    <Button size="sm" variant="secondary" onClick={retry}>
                      Try again
                    </Button>
                  }
                >
                  The table above has the same numbers.
                </Alert>
              )}
            >
              {printing ? null : (
                <Suspense fallback={<PageSpinner label="Loading the graph" />}>
                  <BreakChartGraph answer={answer} units={units} />
                </Suspense>
              )}
            </ErrorBoundary>
          </Card>
        </div>
      ) : null}
    </>
  );
}
