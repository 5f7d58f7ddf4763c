// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { act } from "react";
import { afterEach, expect, test, vi } from "vitest";
import { toast } from "../../lib/toast";
import { Toaster } from "./toaster";

// Counts how often the app fetches sonner (the factory runs when `import("sonner")` is first evaluated).
const sonner = vi.hoisted(() => ({ fetched: 0 }));
vi.mock("sonner", async (original) => {
  sonner.fetched++;
  return await original();
});

afterEach(() => {
  cleanup();
});

// A page that shows no toast never fetches sonner: fetched and started as the app hydrated, it put its evaluation and
// a restyle of the whole page into the first page's hydration (issue 18).
test("the Toaster alone fetches nothing; sonner comes with the first toast", async () => {
  render(<Toaster />);
  await act(() => new Promise((resolve) => setTimeout(resolve, 200)));
  expect(sonner.fetched).toBe(0);
  expect(document.querySelector("section[aria-label^='Notifications']")).toBeNull();
  toast.success("The first toast.");
  expect(await screen.findByText("The first toast.")).toBeInTheDocument();
  expect(sonner.fetched).toBe(1);
});

// sonner is fetched when first asked for (src/lib/toast.ts); nothing a page says in a toast may be lost meanwhile.
test("a toast sent before sonner and the Toaster are there is shown once they are, and later ones at once", async () => {
  toast.success("Saved before the toaster was there.");
  render(<Toaster />);
  expect(await screen.findByText("Saved before the toaster was there.")).toBeInTheDocument();
  toast.error("Could not save.");
  expect(await screen.findByText("Could not save.")).toBeInTheDocument();
});
