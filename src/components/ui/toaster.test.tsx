// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, expect, test } from "vitest";
import { toast } from "../../lib/toast";
import { Toaster } from "./toaster";

afterEach(() => {
  cleanup();
});

// sonner is fetched after the first page (src/lib/toast.ts); nothing a page says in a toast may be lost meanwhile.
test("a toast sent before sonner and the Toaster are there is shown once they are, and later ones at once", async () => {
  toast.success("Saved before the toaster was there.");
  render(<Toaster />);
  expect(await screen.findByText("Saved before the toaster was there.")).toBeInTheDocument();
  toast.error("Could not save.");
  expect(await screen.findByText("Could not save.")).toBeInTheDocument();
});
