// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { act, cleanup, fireEvent, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { http, HttpResponse, network } from "../../../testing/network";
import { LadderBuilder } from "./ladder-builder";

vi.mock("../../../lib/auth-client", () => ({ authClient: {} }));

let posted: unknown[] = [];

beforeEach(() => {
  posted = [];
  network.use(
    http.post("/api/ladders", async ({ request }) => {
      const body = (await request.json()) as object;
      posted.push(body);
      return HttpResponse.json(
        { ...body, id: "11111111-1111-4111-8111-111111111111", builtIn: false, ownerId: "c1", createdAt: "x", updatedAt: "x" },
        { status: 201 },
      );
    }),
  );
  // jsdom lays nothing out; dnd-kit's keyboard sensor moves by measured boxes, so give each rung a 100 px row.
  vi.spyOn(HTMLElement.prototype, "getBoundingClientRect").mockImplementation(function (this: HTMLElement) {
    const item = this.closest<HTMLElement>("[data-rung-index]");
    const i = item ? Number(item.dataset.rungIndex) : 0;
    const top = i * 100;
    return { x: 0, y: top, top, left: 0, width: 600, height: 90, right: 600, bottom: top + 90, toJSON: () => ({}) } as DOMRect;
  });
});
afterEach(() => {
  cleanup();
});

function renderBuilder() {
  return renderRoute(<LadderBuilder units="imperial" />, {
    at: "/ladders/new",
    routes: [{ path: "/ladders/:id", element: <p>Ladder page</p> }],
  });
}

const previewLines = () =>
  within(screen.getByTestId("ladder-preview-rungs"))
    .getAllByRole("listitem")
    .map((li) => li.querySelector("p")?.textContent);

test("the preview reads each rung's rule in words, as the player will see it", () => {
  renderBuilder();
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 3 ft"]);
});

test("adding and duplicating rungs adds them in place, and the preview follows", async () => {
  const user = userEvent.setup();
  renderBuilder();
  await user.click(screen.getByRole("button", { name: "Add a rung" }));
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 3 ft", "Rung 2: Hole 3 of 5 from 4 ft"]);

  const second = screen.getByRole("listitem", { name: "Rung 2" });
  await user.clear(within(second).getByLabelText("Holed needed"));
  await user.type(within(second).getByLabelText("Holed needed"), "4");
  await user.click(screen.getByRole("button", { name: "Duplicate rung 1" }));
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 3 ft", "Rung 2: Hole 3 of 5 from 3 ft", "Rung 3: Hole 4 of 5 from 4 ft"]);
});

test("the keyboard reorders rungs: space to pick up, an arrow to move, space to drop", async () => {
  const user = userEvent.setup();
  renderBuilder();
  await user.click(screen.getByRole("button", { name: "Add a rung" }));
  await user.click(screen.getByRole("button", { name: "Add a rung" }));
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 3 ft", "Rung 2: Hole 3 of 5 from 4 ft", "Rung 3: Hole 3 of 5 from 5 ft"]);

  const handle = screen.getByRole("button", { name: "Drag rung 1" });
  handle.focus();
  // dnd-kit's sensor listens for key codes on the handle, then on the document while dragging.
  fireEvent.keyDown(handle, { code: "Space", key: " " });
  // The sensor starts listening on the next tick.
  await act(() => new Promise((resolve) => setTimeout(resolve, 0)));
  await act(async () => {
    fireEvent.keyDown(document, { code: "ArrowDown", key: "ArrowDown" });
  });
  await act(async () => {
    fireEvent.keyDown(document, { code: "Space", key: " " });
  });
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 4 ft", "Rung 2: Hole 3 of 5 from 3 ft", "Rung 3: Hole 3 of 5 from 5 ft"]);
});

test("the Up and Down buttons move a rung and keep the focus on it", async () => {
  const user = userEvent.setup();
  renderBuilder();
  await user.click(screen.getByRole("button", { name: "Add a rung" }));
  screen.getByRole("button", { name: "Move rung 2 up" }).focus();
  await user.keyboard("{Enter}");
  expect(previewLines()).toEqual(["Rung 1: Hole 3 of 5 from 4 ft", "Rung 2: Hole 3 of 5 from 3 ft"]);
  expect(screen.getByText("Rung 2 moved to position 1.")).toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Move rung 1 up" })).toHaveFocus();
});

test("more holed than balls shows the shared schema's message beside the field and sends nothing", async () => {
  const user = userEvent.setup();
  renderBuilder();
  await user.type(screen.getByLabelText("Ladder name"), "Short game");
  const rung = screen.getByRole("listitem", { name: "Rung 1" });
  await user.clear(within(rung).getByLabelText("Balls"));
  await user.type(within(rung).getByLabelText("Balls"), "2");
  await user.click(screen.getByRole("button", { name: "Save ladder" }));

  expect(await screen.findByText("Needs 3 holed but the rung has only 2 balls")).toBeInTheDocument();
  expect(within(rung).getByLabelText("Holed needed")).toHaveAccessibleDescription("Needs 3 holed but the rung has only 2 balls");
  expect(posted).toEqual([]);
});

test("a valid ladder is sent in metres and the coach lands on its page", async () => {
  const user = userEvent.setup();
  renderBuilder();
  await user.type(screen.getByLabelText("Ladder name"), "Short game");
  await user.click(screen.getByRole("radio", { name: /Drop one rung/ }));
  await user.click(screen.getByRole("button", { name: "Save ladder" }));
  expect(await screen.findByText("Ladder page")).toBeInTheDocument();
  expect(posted).toEqual([
    { name: "Short game", failRule: "drop-one", rungs: [{ distanceM: 0.914, balls: 5, passRule: { kind: "make", made: 3 } }] },
  ]);
});
