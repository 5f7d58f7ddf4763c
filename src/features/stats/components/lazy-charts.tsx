import { lazy, Suspense, type ComponentProps, type ReactNode } from "react";
import { Button, ErrorBoundary, Spinner } from "../../../components/ui";

// recharts is heavy: every chart comes from one lazily loaded module, its own chunk, after the tables are on screen.
const load = () => import("./charts");
const MakeRateChartLazy = lazy(() => load().then((m) => ({ default: m.MakeRateChart })));
const TrendChartLazy = lazy(() => load().then((m) => ({ default: m.TrendChart })));
const CompareChartLazy = lazy(() => load().then((m) => ({ default: m.CompareChart })));
const SessionsChartLazy = lazy(() => load().then((m) => ({ default: m.SessionsChart })));

/** Each chart gets its own error boundary: a failed chart leaves the page and its table standing. */
function ChartFrame({ children, height = "h-72 sm:h-80" }: { children: ReactNode; height?: string }) {
  return (
    <ErrorBoundary
      fallback={(_error, retry) => (
        <div
          className={`flex ${height} flex-col items-center justify-center gap-3 rounded-xl bg-white/60 p-4 text-center text-ink-600 ring-1 ring-ink-900/10`}
        >
          <p>The chart could not be drawn. The table has the same numbers.</p>
          <Button size="sm" variant="secondary" onClick={retry}>
            Try again
          </Button>
        </div>
      )}
    >
      <Suspense
        fallback={
          <div className={`flex ${height} items-center justify-center text-ink-400`}>
            <Spinner label="Drawing the chart" />
          </div>
        }
      >
        {children}
      </Suspense>
    </ErrorBoundary>
  );
}

type Charts = typeof import("./charts");

export function MakeRateChart(props: ComponentProps<Charts["MakeRateChart"]>) {
  return (
    <ChartFrame>
      <MakeRateChartLazy {...props} />
    </ChartFrame>
  );
}
export function TrendChart(props: ComponentProps<Charts["TrendChart"]>) {
  return (
    <ChartFrame>
      <TrendChartLazy {...props} />
    </ChartFrame>
  );
}
export function CompareChart(props: ComponentProps<Charts["CompareChart"]>) {
  return (
    <ChartFrame>
      <CompareChartLazy {...props} />
    </ChartFrame>
  );
}
export function SessionsChart(props: ComponentProps<Charts["SessionsChart"]>) {
  return (
    <ChartFrame height="h-56">
      <SessionsChartLazy {...props} />
    </ChartFrame>
  );
}
