import { isRouteErrorResponse, useRouteError } from "react-router";
import { Button, ButtonLink, LogoMark } from "../../components/ui";
import { paths } from "../../config/paths";
import { isApiError } from "../../lib/api-client";

type Described = { status?: number; title: string; message: string; detail?: string };

const notFound: Described = {
  status: 404,
  title: "Page not found",
  message: "There is nothing at this address. It may have moved, or the link may be mistyped.",
};

function describe(error: unknown): Described {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return notFound;
    return {
      status: error.status,
      title: "Something went wrong",
      message: typeof error.data === "string" && error.data ? error.data : error.statusText || "The page could not be shown.",
    };
  }
  if (isApiError(error)) {
    if (error.status === 404) return notFound;
    if (error.status === 403) return { status: 403, title: "Not available to you", message: error.message };
    return { status: error.status || undefined, title: "Something went wrong", message: error.message };
  }
  if (error instanceof Error && /dynamically imported module|Importing a module script failed|Failed to fetch/i.test(error.message)) {
    return {
      title: "Borrowline has been updated",
      message: "Part of the page could not be loaded, probably because a newer version is out. Reload to get it.",
    };
  }
  return {
    title: "Something went wrong",
    message: "The page hit an unexpected problem. Reloading often helps; if it keeps happening, tell us what you were doing.",
    detail: import.meta.env.DEV && error instanceof Error ? (error.stack ?? error.message) : undefined,
  };
}

export function ErrorPanel({ error }: { error: unknown }) {
  return <ErrorView d={describe(error)} />;
}

function ErrorView({ d }: { d: Described }) {
  return (
    <section aria-labelledby="error-title" className="flex max-w-xl flex-col items-start gap-4 py-6">
      <title>{`${d.title} · Borrowline`}</title>
      {d.status ? <p className="text-sm font-semibold tracking-wide text-coral-700 uppercase">Error {d.status}</p> : null}
      <h1 id="error-title" className="text-3xl font-semibold tracking-tight sm:text-4xl">
        {d.title}
      </h1>
      <p className="text-lg text-ink-600">{d.message}</p>
      <div className="mt-2 flex flex-col gap-3 sm:flex-row">
        <ButtonLink to={paths.home.href()} size="lg">
          Go to the home page
        </ButtonLink>
        {d.status === 404 ? null : (
          <Button variant="secondary" size="lg" onClick={() => window.location.reload()}>
            Reload
          </Button>
        )}
      </div>
      {d.detail ? (
        <pre className="mt-4 max-h-72 w-full overflow-auto rounded-xl bg-ink-900 p-4 text-xs text-sand-100">{d.detail}</pre>
      ) : null}
    </section>
  );
}

/** Inside the app shell: the top bar stays usable while one page fails. */
export function RouteErrorBoundary() {
  return <ErrorPanel error={useRouteError()} />;
}

/** Last resort, used when the shell itself fails: no navigation, no data. */
export function RootErrorBoundary() {
  const error = useRouteError();
  return (
    <div className="min-h-dvh">
      <header className="bg-ink-900 text-sand-50">
        <div className="mx-auto flex h-16 max-w-6xl items-center gap-2.5 px-4 text-xl font-semibold sm:px-6">
          <LogoMark />
          Borrowline
        </div>
      </header>
      <main className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
        <ErrorPanel error={error} />
      </main>
    </div>
  );
}

/** The catch-all route for client paths that do not exist. */
export function NotFoundRoute() {
  return <ErrorView d={notFound} />;
}
