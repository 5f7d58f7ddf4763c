import { expect, test } from "vitest";
import { linkify } from "./linkify";

test("a reset link inside a sentence becomes a link part without the full stop", () => {
  expect(linkify("Open http://localhost:3000/reset-password?token=abc. Thanks")).toEqual([
    { kind: "text", text: "Open " },
    { kind: "link", text: "http://localhost:3000/reset-password?token=abc", href: "http://localhost:3000/reset-password?token=abc" },
    { kind: "text", text: ". Thanks" },
  ]);
});

test("text without links stays one text part", () => {
  expect(linkify("No links here")).toEqual([{ kind: "text", text: "No links here" }]);
});

test("two links on separate lines are both found", () => {
  const parts = linkify("a https://x.test/1\nb https://x.test/2");
  expect(parts.filter((p) => p.kind === "link").map((p) => p.text)).toEqual(["https://x.test/1", "https://x.test/2"]);
});
