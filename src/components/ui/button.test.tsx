// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { useState } from "react";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { Button } from "./button";

afterEach(cleanup);

/** A button whose action stays pending until the test says so. */
function Saver({ onSave, onSubmit }: { onSave: () => void; onSubmit: () => void }) {
  const [pending, setPending] = useState(false);
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
    >
      <label>
        Note <input name="note" />
      </label>
      <Button
        type="submit"
        loading={pending}
        loadingText="Saving…"
        onClick={() => {
          onSave();
          setPending(true);
        }}
      >
        Save
      </Button>
    </form>
  );
}

test("a pending button keeps the focus and ignores clicks, Enter and Space until it is done", async () => {
  const onSave = vi.fn();
  const onSubmit = vi.fn();
  const user = userEvent.setup();
  render(<Saver onSave={onSave} onSubmit={onSubmit} />);
  await user.tab();
  await user.tab();
  expect(screen.getByRole("button", { name: "Save" })).toHaveFocus();
  await user.keyboard("{Enter}");
  expect(onSave).toHaveBeenCalledTimes(1);
  expect(onSubmit).toHaveBeenCalledTimes(1);

  const busy = screen.getByRole("button", { name: /Saving/ });
  expect(busy).toHaveAttribute("aria-disabled", "true");
  expect(busy).not.toBeDisabled();
  expect(busy).toHaveFocus();
  await user.keyboard("{Enter}");
  await user.keyboard(" ");
  await user.click(busy);
  // Enter in the field clicks the form's submit button: refused too.
  await user.type(screen.getByLabelText("Note"), "x{Enter}");
  expect(onSave).toHaveBeenCalledTimes(1);
  expect(onSubmit).toHaveBeenCalledTimes(1);
});

test("aria-disabled given directly also ignores clicks; disabled stays for a control that cannot act", async () => {
  const onClick = vi.fn();
  const user = userEvent.setup();
  render(
    <>
      <Button aria-disabled onClick={onClick}>
        Undo
      </Button>
      <Button pending onClick={onClick}>
        Resend
      </Button>
      <Button disabled onClick={onClick}>
        Next page
      </Button>
    </>,
  );
  await user.click(screen.getByRole("button", { name: "Undo" }));
  await user.click(screen.getByRole("button", { name: "Resend" }));
  expect(onClick).not.toHaveBeenCalled();
  expect(screen.getByRole("button", { name: "Resend" })).toHaveAttribute("aria-disabled", "true");
  expect(screen.getByRole("button", { name: "Next page" })).toBeDisabled();
});
