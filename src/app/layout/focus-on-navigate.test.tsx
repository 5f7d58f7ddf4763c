// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { StrictMode } from "react";
import { afterEach, expect, test } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { Link, MemoryRouter, Route, Routes, useSearchParams } from "react-router";
import { useFocusHeadingOnNavigate } from "./focus-on-navigate";

afterEach(cleanup);

function Shell({ children }: { children: React.ReactNode }) {
  useFocusHeadingOnNavigate();
  return <main id="main">{children}</main>;
}

function First() {
  const [, setParams] = useSearchParams();
  return (
    <>
      <h1>First page</h1>
      <Link to="/second">Go on</Link>
      <input aria-label="Distance" onChange={(e) => setParams({ d: e.target.value })} />
    </>
  );
}

function app() {
  return (
    <MemoryRouter initialEntries={["/"]}>
      <Shell>
        <Routes>
          <Route path="/" element={<First />} />
          <Route path="/second" element={<h1>Second page</h1>} />
        </Routes>
      </Shell>
    </MemoryRouter>
  );
}

test("after following a link, focus is on the new page's heading (focusable by script only)", async () => {
  render(app());
  expect(screen.getByRole("heading", { name: "First page" })).not.toHaveFocus();
  await userEvent.click(screen.getByRole("link", { name: "Go on" }));
  const heading = await screen.findByRole("heading", { name: "Second page" });
  await expect.poll(() => document.activeElement).toBe(heading);
  expect(heading).toHaveAttribute("tabindex", "-1");
});

test("a change of the query alone (typing into a read) leaves focus in the field", async () => {
  render(app());
  const field = screen.getByRole("textbox", { name: "Distance" });
  await userEvent.type(field, "12");
  await new Promise((r) => setTimeout(r, 100));
  expect(field).toHaveFocus();
});

test("the first load leaves focus alone, even when React runs the effect twice (StrictMode, as in development)", async () => {
  render(<StrictMode>{app()}</StrictMode>);
  const heading = screen.getByRole("heading", { name: "First page" });
  // Past the frames in which a heading would be focused.
  await new Promise((r) => setTimeout(r, 150));
  expect(heading).not.toHaveFocus();
  await userEvent.click(screen.getByRole("link", { name: "Go on" }));
  await expect.poll(() => document.activeElement).toBe(await screen.findByRole("heading", { name: "Second page" }));
});
