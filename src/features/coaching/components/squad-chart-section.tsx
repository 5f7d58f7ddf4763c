import { lazy, Suspense, useState } from "react";
import type { Squad } from "#shared/schemas/squads";
import { Alert, Card, CardTitle, ErrorBoundary, SelectField, Spinner } from "../../../components/ui";
import { useSquadMakeRates } from "../api/get-make-rates";
import { useUnits } from "../../auth/hooks/use-units";
import { squadChartData } from "../utils/squad-chart-data";

const SquadChart = lazy(() => import("./squad-chart"));

/** Make rates by distance band compared across one squad's players. */
export function SquadChartSection({ squads, squadId }: { squads: Squad[]; squadId?: string }) {
  const { units } = useUnits();
  const [chosen, setChosen] = useState("");
  const withPlayers = squads.filter((s) => s.members.length > 0);
  const squad = withPlayers.find((s) => s.id === (chosen || squadId)) ?? withPlayers[0];
  const members = squad?.members ?? [];
  const results = useSquadMakeRates(members.map((m) => m.id));
  const loading = results.some((r) => r.isPending);
  const failed = results.filter((r) => r.isError).length;
  const rates = new Map(members.map((m, i) => [m.id, results[i]?.data?.bands]));
  const data = squadChartData(members, rates, units);

  if (!squad) return null;
  return (
    <Card>
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
        <div>
          <CardTitle>Make rates across the squad</CardTitle>
          <p className="mt-1 text-ink-500">
            Share of putts holed in each distance band, from every logged putt (practice and ladders). Bands with no putts are left out.
          </p>
        </div>
        {withPlayers.length > 1 ? (
          <SelectField
            label="Squad"
            value={squad.id}
            onChange={(e) => setChosen(e.target.value)}
            options={withPlayers.map((s) => ({ value: s.id, label: s.name }))}
            containerClassName="sm:w-60"
          />
        ) : null}
      </div>
      <div className="mt-4">
        {loading ? (
          <Spinner label="Loading make rates" />
        ) : data.rows.length === 0 ? (
          <p className="text-ink-500">No putts logged by {squad.name} yet.</p>
        ) : (
          <ErrorBoundary
            fallback={() => (
              <p className="text-sm text-ink-500">The chart could not be drawn here. Each player&rsquo;s page lists their rates.</p>
            )}
          >
            <Suspense fallback={<Spinner label="Loading the chart" />}>
              <SquadChart data={data} />
            </Suspense>
          </ErrorBoundary>
        )}
        {failed > 0 ? (
          <Alert tone="warning" className="mt-3">
            The make rates of {failed} player{failed === 1 ? "" : "s"} could not be loaded and are left out.
          </Alert>
        ) : null}
      </div>
    </Card>
  );
}
