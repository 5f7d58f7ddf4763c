// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { UpdatePrompt } from "./update-prompt";

afterEach(cleanup);

test("nothing shows until a new version waits", () => {
  render(<UpdatePrompt needRefresh={false} onReload={vi.fn()} onDismiss={vi.fn()} />);
  expect(screen.queryByText("A new version is ready")).not.toBeInTheDocument();
});

test("a waiting version: 'A new version is ready' with Reload and Later, by keyboard", async () => {
  const onReload = vi.fn();
  const onDismiss = vi.fn();
  const user = userEvent.setup();
  render(<UpdatePrompt needRefresh onReload={onReload} onDismiss={onDismiss} />);
  expect(screen.getByRole("status")).toHaveTextContent("A new version is ready");
  await user.tab();
  await user.tab();
  expect(screen.getByRole("button", { name: "Reload" })).toHaveFocus();
  await user.keyboard("{Enter}");
  expect(onReload).toHaveBeenCalledTimes(1);
  await user.click(screen.getByRole("button", { name: "Later" }));
  expect(onDismiss).toHaveBeenCalledTimes(1);
});
