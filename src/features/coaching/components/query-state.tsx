import type { ReactNode } from "react";
import { Alert, Button, PageSpinner } from "../../../components/ui";

type QueryLike = { isPending: boolean; isError: boolean; error: Error | null; refetch: () => unknown };

/** The loading spinner or the failure (with "Try again") of a page's main query; else the page. */
export function QueryState({ query, label, children }: { query: QueryLike; label: string; children: () => ReactNode }) {
  if (query.isPending) return <PageSpinner label={label} />;
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="Could not load this"
        action={
          <Button size="sm" variant="secondary" onClick={() => void query.refetch()}>
            Try again
          </Button>
        }
      >
        {query.error?.message}
      </Alert>
    );
  }
  return <>{children()}</>;
}
