// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { QueryClientProvider } from "@tanstack/react-query";
import { createMemoryRouter, RouterProvider } from "react-router";
import { createTestQueryClient } from "../testing/render";
import { meAnswer, network } from "../testing/network";
import { createAppRoutes } from "./router";

vi.mock("../lib/auth-client", () => ({ authClient: {} }));

afterEach(() => {
  cleanup();
});

function renderAt(path: string) {
  network.use(meAnswer(null));
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
