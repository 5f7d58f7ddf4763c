import { RequireAuth } from "../../features/auth/components/require-auth";
import { StatsPage } from "../../features/stats/components/stats-page";
import { PracticeNav } from "../layout/practice-nav";

// The charts inside are loaded lazily (their own chunk with recharts), after the tables are on screen.
export function StatsRoute() {
  return (
    <>
      <PracticeNav />
      <RequireAuth>
        <StatsPage />
      </RequireAuth>
    </>
  );
}

export { StatsRoute as Component };
