// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { WalkGreen } from "./walk-green";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

test("the walk's grid is checked before anything starts: too few spots and too wide a spacing are named beside their fields", async () => {
  const fetch = vi.fn();
  vi.stubGlobal("fetch", fetch);
  renderRoute(<WalkGreen greenId="g1" replacing={false} />, { at: "/greens/g1/map" });
  const user = userEvent.setup();
  await user.clear(screen.getByLabelText("Across"));
  await user.type(screen.getByLabelText("Across"), "2");
  await user.clear(screen.getByLabelText("Apart (m)"));
  await user.type(screen.getByLabelText("Apart (m)"), "5");
  await user.click(screen.getByRole("button", { name: "Start walking" }));
  expect(screen.getByText("Enter a whole number from 3 to 20.")).toBeInTheDocument();
  expect(screen.getByText("Enter 0.5–3 m (a pace or two).")).toBeInTheDocument();
  expect(screen.queryByText(/Spot 1 of/)).not.toBeInTheDocument();
  expect(fetch).not.toHaveBeenCalled();
});

test("a browser without a tilt sensor (jsdom has none) is told so and stays on the setup", async () => {
  renderRoute(<WalkGreen greenId="g1" replacing={false} />, { at: "/greens/g1/map" });
  const user = userEvent.setup();
  await user.click(screen.getByRole("button", { name: "Start walking" }));
  expect(await screen.findByText(/gives no tilt readings|secure \(https\) address/)).toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Start walking" })).toBeInTheDocument();
});
