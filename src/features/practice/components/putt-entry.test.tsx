// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { PuttEntry, type PuttDraft } from "./putt-entry";

afterEach(cleanup);

const INCH = 0.0254;

function setup() {
  const onLog = vi.fn<(d: PuttDraft) => void>();
  render(
    <PuttEntry
      units="imperial"
      distanceM={6 * 0.3048}
      onDistanceChange={() => undefined}
      breakType={null}
      onBreakTypeChange={() => undefined}
      onLog={onLog}
    />,
  );
  const miss = screen.getByRole("region", { name: "A miss" });
  const missed = () => within(miss).getByRole("button", { name: /^Missed/ });
  return { onLog, miss, missed };
}

test("Left, then Long, then Missed never logs a putt that has lost its finish", async () => {
  const user = userEvent.setup();
  const { onLog, miss, missed } = setup();
  await user.click(within(miss).getByRole("button", { name: "Left" }));
  await user.click(within(miss).getByRole("button", { name: "Long" }));
  expect(missed()).toHaveTextContent("left, long");
  await user.click(missed());
  // Either nothing is logged yet, or what is logged keeps "long": never missLengthM null under "left, long".
  for (const [draft] of onLog.mock.calls) expect(draft.missLengthM).not.toBeNull();
  expect(missed()).toBeDisabled();
  expect(screen.getByText(/Pick how far long it finished/)).toBeInTheDocument();
  // Picking the length logs exactly what the button says.
  await user.click(within(miss).getByRole("button", { name: "12" }));
  expect(missed()).toHaveTextContent("left, 12 in long");
  await user.click(missed());
  expect(onLog).toHaveBeenCalledTimes(1);
  expect(onLog.mock.calls[0]![0]).toMatchObject({ holed: false, missSide: "left" });
  expect(onLog.mock.calls[0]![0].missLengthM).toBeCloseTo(12 * INCH, 9);
});

test("tapping the finish again takes it back and the miss logs with its side only", async () => {
  const user = userEvent.setup();
  const { onLog, miss, missed } = setup();
  await user.click(within(miss).getByRole("button", { name: "Right" }));
  await user.click(within(miss).getByRole("button", { name: "Short" }));
  await user.click(within(miss).getByRole("button", { name: "Short" }));
  expect(missed()).toBeEnabled();
  await user.click(missed());
  expect(onLog).toHaveBeenCalledWith(expect.objectContaining({ missSide: "right", missLengthM: null }));
});

// Every order of the three taps (side, finish, length; length only once a finish is chosen) logs what was shown.
const STEPS = { side: "Right", finish: "Short", length: "24" } as const;
const ORDERS: (keyof typeof STEPS)[][] = [
  ["side", "finish", "length"],
  ["finish", "side", "length"],
  ["finish", "length", "side"],
];
test.each(ORDERS)("taps in the order %s, %s, %s reach onLog as shown", async (...order) => {
  const user = userEvent.setup();
  const { onLog, miss, missed } = setup();
  for (const step of order) await user.click(within(miss).getByRole("button", { name: STEPS[step] }));
  expect(missed()).toHaveTextContent("right, 24 in short");
  await user.click(missed());
  expect(onLog).toHaveBeenCalledTimes(1);
  const draft = onLog.mock.calls[0]![0];
  expect(draft.missSide).toBe("right");
  expect(draft.missLengthM).toBeCloseTo(-24 * INCH, 9);
});
