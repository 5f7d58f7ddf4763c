// Test helpers for components: a fresh query client and an in-memory router per test.
import type { ReactElement } from "react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { createMemoryRouter, RouterProvider, type RouteObject } from "react-router";
import { render } from "@testing-library/react";

export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity, staleTime: Infinity }, mutations: { retry: false } },
  });
}

export type RenderRouteOptions = {
  /** Where the test starts, e.g. "/sign-up?next=%2Faccount". */
  at: string;
  /** Extra routes to land on, e.g. `{ path: "/", element: <p>Home page</p> }`. */
  routes?: RouteObject[];
  queryClient?: QueryClient;
};

/** Renders `element` at the path of `at` (without its query string) inside a memory router. */
export function renderRoute(element: ReactElement, { at, routes = [], queryClient = createTestQueryClient() }: RenderRouteOptions) {
  const path = at.split("?")[0] ?? "/";
  const router = createMemoryRouter([{ path, element }, ...routes], { initialEntries: [at] });
  const result = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...result, router, queryClient };
}

/** A fetch stand-in answering JSON by URL path; unknown paths answer 404 in the API's error shape. */
export function fakeFetch(answers: Record<string, { status?: number; body?: unknown }>) {
  return async (input: RequestInfo | URL): Promise<Response> => {
    const url = new URL(typeof input === "string" ? input : input instanceof URL ? input.href : input.url, "http://localhost");
    const answer = answers[url.pathname] ?? { status: 404, body: { error: { code: "NOT_FOUND", message: "Not found" } } };
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status: answer.status ?? 200,
      headers: { "Content-Type": "application/json" },
    });
  };
}
