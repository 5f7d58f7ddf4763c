// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { CopyLinkButton } from "./copy-link-button";

function giveClipboard(writeText: ((text: string) => Promise<void>) | null) {
  Object.defineProperty(navigator, "clipboard", { value: writeText ? { writeText } : undefined, configurable: true });
}

afterEach(() => {
  cleanup();
  vi.useRealTimers();
  giveClipboard(null);
});

test("copies the link as it is at the click, says so, and offers to copy again after a moment", async () => {
  vi.useFakeTimers();
  const writeText = vi.fn(async (_text: string) => undefined);
  giveClipboard(writeText);
  let address = "https://borrowline.example/read?d=3";
  render(<CopyLinkButton link={() => address} linkName="the link to this read" label="Copy link to this read" />);
  address = "https://borrowline.example/read?d=6";
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Copy link to this read" }));
  });
  expect(writeText).toHaveBeenCalledWith("https://borrowline.example/read?d=6");
  expect(screen.getByRole("button", { name: "Link copied" })).toBeInTheDocument();
  expect(screen.getByText("Copied the link to this read.")).toBeInTheDocument();
  act(() => {
    vi.advanceTimersByTime(2600);
  });
  expect(screen.getByRole("button", { name: "Copy link to this read" })).toBeInTheDocument();
});

test("without a clipboard (a page not served over HTTPS) the link is shown in a field, selected, to copy by hand", async () => {
  giveClipboard(null);
  const link = "https://borrowline.example/join/abc";
  render(
    <CopyLinkButton
      link={link}
      linkName="the invitation link for ruth@example.test"
      accessibleName="Copy the invitation link for ruth@example.test"
    />,
  );
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Copy the invitation link for ruth@example.test" }));
  });
  const field = screen.getByRole<HTMLInputElement>("textbox", { name: "The invitation link for ruth@example.test, to copy" });
  expect(field.value).toBe(link);
  expect([field.selectionStart, field.selectionEnd]).toEqual([0, link.length]);
  expect(screen.getByText("Copying was refused: the invitation link for ruth@example.test is shown to copy.")).toBeInTheDocument();
});

test("a clipboard that refuses (permission) shows the field too", async () => {
  giveClipboard(async () => {
    throw new DOMException("Write permission denied.", "NotAllowedError");
  });
  render(<CopyLinkButton link="https://borrowline.example/join/xyz" linkName="the new invitation link" label="Copy the new link" />);
  await act(async () => {
    fireEvent.click(screen.getByRole("button", { name: "Copy the new link" }));
  });
  expect(screen.getByRole<HTMLInputElement>("textbox", { name: "The new invitation link, to copy" }).value).toBe(
    "https://borrowline.example/join/xyz",
  );
  expect(screen.queryByRole("button", { name: "Link copied" })).toBeNull();
});
