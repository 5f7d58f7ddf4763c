import { ChartPage } from "../../features/reads/components/chart-page";

export function ChartRoute() {
  return <ChartPage />;
}

export { ChartRoute as Component };
