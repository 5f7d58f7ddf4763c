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

test("where the browser gives no compass heading (jsdom has the orientation event but no absolute one) the compass way is shown as unavailable with its reason, and the fixed mark stays chosen", async () => {
  renderRoute(<WalkGreen greenId="g1" replacing={false} />, { at: "/greens/g1/map" });
  const compass = screen.getByRole("radio", { name: /Any way round, by the compass/ });
  expect(compass).toBeDisabled();
  expect(screen.getByRole("radio", { name: /Top edge toward a fixed mark/ })).toBeChecked();
  expect(screen.getByText(/Not available here: This browser gives the phone.s tilt but not a compass heading\./)).toBeInTheDocument();
  await userEvent.setup().click(compass);
  expect(screen.getByRole("radio", { name: /Top edge toward a fixed mark/ })).toBeChecked();
  expect(screen.queryByText(/Compass caution/)).not.toBeInTheDocument();
});
