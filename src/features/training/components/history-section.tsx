import { lazy, Suspense, useMemo } from "react";
import { useLocation } from "react-router";
import { Alert, Card, CardTitle, ErrorBoundary, Spinner, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useAttempts } from "../api/get-attempts";
import { ROLLING_WINDOW, historyChartData } from "../utils/history-chart-data";

const HistoryChart = lazy(() => import("./history-chart"));

/** How the player's reading improves: the chart for a signed-in player, an invitation for everyone else. */
export function HistorySection({ signedIn }: { signedIn: boolean }) {
  const location = useLocation();
  const attempts = useAttempts(signedIn);
  const rows = useMemo(() => historyChartData(attempts.data?.items ?? []), [attempts.data]);
  if (!signedIn) {
    return (
      <Alert tone="info" title="Sign in to keep a history">
        You can train without an account. <TextLink to={paths.signIn.href(`${location.pathname}${location.search}`)}>Sign in</TextLink> or{" "}
        <TextLink to={paths.signUp.href(`${location.pathname}${location.search}`)}>create an account</TextLink> to keep your scores and see
        your reading improve.
      </Alert>
    );
  }
  const last = rows.slice(-ROLLING_WINDOW);
  return (
    <Card>
      <CardTitle>Your reading over time</CardTitle>
      {attempts.isPending ? (
        <div className="py-8">
          <Spinner label="Loading your history" />
        </div>
      ) : rows.length === 0 ? (
        <p className="mt-2 text-ink-500">Reveal a read and it is kept here, so you can see your reading improve.</p>
      ) : (
        <>
          <p className="mt-1 text-ink-600">
            {rows.length} read{rows.length === 1 ? "" : "s"} kept. Mean of the last {last.length}:{" "}
            <strong>{last[last.length - 1]!.rollingMean}</strong>; best score: <strong>{Math.max(...rows.map((r) => r.score))}</strong>.
          </p>
          <ErrorBoundary
            fallback={() => <p className="mt-3 text-sm text-ink-500">The chart could not be drawn here; the numbers above still stand.</p>}
          >
            <Suspense fallback={<Spinner label="Loading the chart" />}>
              <div className="mt-3">
                <HistoryChart rows={rows} window={ROLLING_WINDOW} />
              </div>
            </Suspense>
          </ErrorBoundary>
        </>
      )}
    </Card>
  );
}
