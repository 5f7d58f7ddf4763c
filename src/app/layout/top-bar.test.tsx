// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../testing/render";
import { meAnswer, network } from "../../testing/network";
import { TopBar } from "./top-bar";

vi.mock("../../lib/auth-client", () => ({ authClient: { signOut: vi.fn(async () => ({ data: { success: true }, error: null })) } }));

afterEach(() => {
  cleanup();
});

const dana = {
  user: { id: "u1", name: "Dana Whitcombe", email: "dana@example.test", role: "coach", emailVerified: true },
  preferences: { units: "imperial" },
};

test("a signed-in user sees who they are signed in as, with their role", async () => {
  network.use(meAnswer(dana));
  renderRoute(<TopBar />, { at: "/" });
  const indicators = await screen.findAllByText((_, el) => el?.tagName === "P" && (el.textContent ?? "").startsWith("Signed in as"));
  expect(indicators[0]).toHaveTextContent("Signed in as Dana Whitcombe (coach)");
  expect(screen.getAllByRole("button", { name: "Sign out" }).length).toBeGreaterThan(0);
});

test("the menu button opens and closes the menu, and Escape closes it", async () => {
  network.use(meAnswer(null));
  const user = userEvent.setup();
  renderRoute(<TopBar />, { at: "/rehearse" });

  const button = screen.getByRole("button", { name: "Menu" });
  expect(button).toHaveAttribute("aria-expanded", "false");
  const menu = document.getElementById(button.getAttribute("aria-controls") ?? "");
  expect(menu).not.toBeVisible();

  await user.click(button);
  expect(button).toHaveAttribute("aria-expanded", "true");
  expect(menu).toBeVisible();
  expect(await within(menu as HTMLElement).findByRole("link", { name: "Sign in" })).toBeInTheDocument();
  // On any page of an area (here Rehearse), the area's item is the current one.
  expect(within(menu as HTMLElement).getByRole("link", { name: "Read a putt" })).toHaveAttribute("aria-current", "page");
  expect(within(menu as HTMLElement).queryByRole("link", { name: "Account" })).not.toBeInTheDocument();

  await user.keyboard("{Escape}");
  expect(button).toHaveAttribute("aria-expanded", "false");
  expect(button).toHaveFocus();
});
