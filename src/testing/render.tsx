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
