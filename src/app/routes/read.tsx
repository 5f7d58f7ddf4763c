import { ReadPage } from "../../features/reads/components/read-page";

export function ReadRoute() {
  return <ReadPage />;
}

export { ReadRoute as Component };
