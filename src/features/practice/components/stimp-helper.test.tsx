// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { BREDE_1990 } from "../../../../tests/fixtures/physics-references";
import { StimpHelper } from "./stimp-helper";

afterEach(cleanup);

test("Brede's example: down 981 cm and up 185 cm show a corrected Stimp of 10.2 ft before saving", async () => {
  // A. D. Brede, "Measuring Green Speed on Sloped Putting Greens", USGA Green Section Record 28(6):10–12, 1990
  // (formula published; the worked example secondary, as quoted with it).
  const onSave = vi.fn();
  const user = userEvent.setup();
  render(<StimpHelper units="metric" onSave={onSave} />);
  expect(screen.getByRole("button", { name: "Save the reading" })).toBeDisabled();
  expect(screen.getByText(/measure green speed only where the course allows it and off the line of play/i)).toBeInTheDocument();

  await user.type(screen.getByLabelText("Up-slope roll, m"), "1");
  await user.type(screen.getByLabelText("Up-slope roll, cm"), "85");
  await user.type(screen.getByLabelText("Down-slope roll, m"), "9");
  await user.type(screen.getByLabelText("Down-slope roll, cm"), "81");

  expect(screen.getByTestId("corrected-stimp")).toHaveTextContent(`${BREDE_1990.correctedFt.toFixed(1)} ft`);
  expect(screen.getByText(/a plain average would say 19\.1 ft/)).toBeInTheDocument();

  await user.click(screen.getByRole("button", { name: "Save 10.2 ft" }));
  expect(onSave).toHaveBeenCalledWith({
    upFt: expect.closeTo(BREDE_1990.upM / 0.3048, 9),
    downFt: expect.closeTo(BREDE_1990.downM / 0.3048, 9),
  });
});

test("in feet and inches, rolls the wrong way round are caught before anything is saved", async () => {
  const onSave = vi.fn();
  const user = userEvent.setup();
  render(<StimpHelper units="imperial" onSave={onSave} />);
  await user.type(screen.getByLabelText("Up-slope roll, ft"), "12");
  await user.type(screen.getByLabelText("Down-slope roll, ft"), "8");
  await user.type(screen.getByLabelText("Down-slope roll, in"), "6");
  expect(screen.getByText(/The up-slope roll is longer than the down-slope one/)).toBeInTheDocument();
  expect(screen.queryByTestId("corrected-stimp")).not.toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Save the reading" })).toBeDisabled();
});
