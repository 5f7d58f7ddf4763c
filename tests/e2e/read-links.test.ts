// Issue 14, item 4: every link between read, rehearse and the break chart carries the whole read (distance, slope,
// fall line, Stimp and pace), followed by clicking as a golfer would.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { DESKTOP, PHONE, openBrowser, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/** Expected refusals (Chromium logs each as a failed resource); any other console error fails the test. */

type Read = Record<"d" | "s" | "f" | "st", number> & ({ rp: number } | { es: number });

/** The read in a page's address, as numbers. */
function readIn(page: Page): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of new URL(page.url()).searchParams) out[k] = Number.parseFloat(v);
  return out;
}

async function expectRead(page: Page, path: string, read: Read) {
  await page.waitForURL((u) => u.pathname === path && u.searchParams.has("d"));
  const got = readIn(page);
  for (const [k, v] of Object.entries(read)) expect(got[k], `${path}: ${k}`).toBeCloseTo(v, 6);
  // Only the read's own pace: a roll-past read never turns into an entry-speed one, or back.
  expect(Object.keys(got).sort(), path).toEqual(Object.keys(read).sort());
}

const query = (r: Read) => new URLSearchParams(Object.entries(r).map(([k, v]) => [k, String(v)])).toString();

test("read → chart → rehearse → read → chart: a 45 cm roll-past read arrives whole at every page", async () => {
  const browser = await openBrowser(DESKTOP);
  const { page } = browser;
  const read: Read = { d: 4.5, s: 3.5, f: 135, st: 11.5, rp: 0.45 };
  try {
    await page.goto(`${server.url}/read?${query(read)}`);
    await page.getByTestId("aim-headline").waitFor();
    await page.getByRole("link", { name: "Break chart for this green" }).click();
    await expectRead(page, "/chart", read);
    // The chart uses the read's own slope, Stimp and pace (45 cm = 17.7 in shows as 18 in, not the default 17).
    const form = page.getByRole("form", { name: "Chart settings" });
    await expect(form.getByLabel("Slope (%)").inputValue()).resolves.toBe("3.5");
    await expect(form.getByLabel("Stimp (ft)").inputValue()).resolves.toBe("11.5");
    await expect(form.getByLabel(/Finish past/).inputValue()).resolves.toBe("18");
    await page
      .getByText(/Slope 3\.5 %, Stimp 11\.5, finishing 18 in past/)
      .filter({ visible: true })
      .first()
      .waitFor();
    await screenshot(page, "read-links-chart-desk");

    await page.getByRole("link", { name: "Rehearse the read" }).click();
    await expectRead(page, "/rehearse", read);
    await page
      .getByText(/Change the putt/)
      .first()
      .waitFor();
    expect(
      await page
        .getByText(/Change the putt/)
        .first()
        .textContent(),
    ).toMatch(/3\.5 %, Stimp 11\.5/);

    await page.getByRole("link", { name: "Open in the read calculator" }).click();
    await expectRead(page, "/read", read);
    await expect(page.getByLabel("Slope (%)").inputValue()).resolves.toBe("3.5");

    await page.goBack();
    await page.getByRole("link", { name: "Break chart for this green" }).click();
    await expectRead(page, "/chart", read);
    await page.getByRole("link", { name: "Back to the read" }).click();
    await expectRead(page, "/read", read);
  } finally {
    await browser.close();
  }
});

test("a dying-pace read stays dying on the chart; an entry-speed read keeps its speed on the chart and becomes its roll-past on rehearse", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    const dying: Read = { d: 2, s: 1.5, f: 270, st: 9.5, rp: 0 };
    await page.goto(`${server.url}/read?${query(dying)}`);
    await page.getByTestId("aim-headline").waitFor();
    await page.getByRole("link", { name: "Break chart for this green" }).click();
    await expectRead(page, "/chart", dying);
    await page
      .getByText(/at a dying pace/)
      .filter({ visible: true })
      .first()
      .waitFor();
    await screenshot(page, "read-links-chart-dying-phone");
    await page.getByRole("link", { name: "Rehearse the read" }).click();
    await expectRead(page, "/rehearse", dying);

    const entry: Read = { d: 3, s: 2, f: 45, st: 10, es: 0.9 };
    await page.goto(`${server.url}/read?${query(entry)}`);
    await page.getByTestId("aim-headline").waitFor();
    await page.getByRole("link", { name: "Break chart for this green" }).click();
    await expectRead(page, "/chart", entry);
    await page
      .getByText(/reaching the hole at 3\.0 ft\/s/)
      .filter({ visible: true })
      .first()
      .waitFor();
    await page.goto(`${server.url}/read?${query(entry)}`);
    await page.getByRole("link", { name: "Rehearse this putt" }).click();
    await page.waitForURL(/\/rehearse\?/);
    await page.getByText(/The read gave its pace as reaching the hole at 3\.0 ft\/s/).waitFor();
    await screenshot(page, "read-links-rehearse-entry-phone");
  } finally {
    await browser.close();
  }
});
