// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { QueryClientProvider } from "@tanstack/react-query";
import { createMemoryRouter, RouterProvider } from "react-router";
import { createTestQueryClient, fakeFetch } from "../testing/render";
import { createAppRoutes } from "./router";

vi.mock("../lib/auth-client", () => ({ authClient: {} }));

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderAt(path: string) {
  vi.stubGlobal("fetch", vi.fn(fakeFetch({ "/api/me": { status: 401, body: { error: { code: "UNAUTHORIZED", message: "Sign in" } } } })));
  const queryClient = createTestQueryClient();
  const router = createMemoryRouter(createAppRoutes(), { initialEntries: [path] });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
}

test("an unknown address shows the page-not-found page inside the app", async () => {
  renderAt("/no/such/page");
  expect(await screen.findByRole("heading", { level: 1, name: "Page not found" })).toBeInTheDocument();
  expect(screen.getByRole("link", { name: "Go to the home page" })).toHaveAttribute("href", "/");
  expect(screen.getAllByRole("link", { name: /Borrowline/ })[0]).toHaveAttribute("href", "/");
});

test("the home page offers a signed-out visitor the way in", async () => {
  renderAt("/");
  expect(await screen.findByRole("heading", { level: 1, name: /Know where to start the ball/ })).toBeInTheDocument();
  expect(await screen.findByRole("link", { name: "create a free account" })).toHaveAttribute("href", "/sign-up");
});
