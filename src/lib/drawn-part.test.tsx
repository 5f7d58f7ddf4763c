// @vitest-environment jsdom
import { act, use, useEffect } from "react";
import { hydrateRoot } from "react-dom/client";
import { renderToString } from "react-dom/server";
import { expect, test } from "vitest";
import { DrawnPart, drawnShellHydrated } from "./drawn-part";

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

function Shell({ part }: { part: React.ReactNode }) {
  useEffect(drawnShellHydrated, []);
  return (
    <main>
      <h1>Read a putt</h1>
      <DrawnPart>{part}</DrawnPart>
    </main>
  );
}

test("a drawn page's controls wait for its parts: the mark goes once the shell and every part have hydrated", async () => {
  // As drawn at build time: the whole page, finished, with the mark on <html>.
  const container = document.createElement("div");
  container.innerHTML = renderToString(<Shell part={<button type="button">Read the putt</button>} />);
  document.body.append(container);
  document.documentElement.setAttribute("data-drawn", "");
  expect(container.querySelector("button")).not.toBeNull();

  // In the browser the part's code has not arrived yet: it suspends while the shell hydrates.
  let arrive!: () => void;
  const partCode = new Promise<void>((resolve) => (arrive = resolve));
  function LatePart() {
    use(partCode);
    return <button type="button">Read the putt</button>;
  }
  await act(async () => {
    hydrateRoot(container, <Shell part={<LatePart />} />);
  });
  // The shell has hydrated (its effect ran) but the part has not: the controls still take no taps.
  expect(document.documentElement.hasAttribute("data-drawn")).toBe(true);
  expect(container.querySelector("button")?.textContent).toBe("Read the putt");

  await act(async () => {
    arrive();
    await partCode;
  });
  expect(document.documentElement.hasAttribute("data-drawn")).toBe(false);
});
