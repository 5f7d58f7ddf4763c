// Issue 17, parts 1 and 2 in Chromium: the phone's gravity is fed as synthetic DeviceMotionEvents. "Measure on the
// green" fills the read form after the half turn; "Map this green" walks a 3 × 3 grid and saves the map; a desk
// browser with no sensor is told so.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { AxeBuilder } from "@axe-core/playwright";
import { DESKTOP, PHONE, appRunning, refusedStatus, openBrowser, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

/**
 * Each reading needs two real seconds of stillness (the product's rule), so these tests wait on the clock by design
 * (about 5 readings and 10 readings); under a loaded machine that outgrows the project's 90 s default.
 */
const SENSOR_TEST_TIMEOUT_MS = 240_000;
const G = 9.80665;
const DEG = Math.PI / 180;
type V3 = [number, number, number];
/** The sensor's own tilt against the phone's case: 0.3° about the phone's x axis (the example). */
const sensor = ([x, y, z]: V3, e = 0.3 * DEG): V3 => [x, y * Math.cos(e) - z * Math.sin(e), y * Math.sin(e) + z * Math.cos(e)];
/** accelerationIncludingGravity of a phone lying on ground of gradient (gx, gy) in its own frame (up = (gx, gy, 1)/n). */
const lying = (gx: number, gy: number): V3 => {
  const n = Math.hypot(gx, gy, 1);
  return sensor([gx / n, gy / n, 1 / n]).map((v) => v * G) as V3;
};
/** A phone in the hand, tipped 20°: what the sensor sees while it is picked up, turned or carried. */
const HANDLING: V3 = [0, Math.sin(20 * DEG) * G, Math.cos(20 * DEG) * G];

/**
 * A feeder in the page: every 20 ms a devicemotion event with the current vector, and (once `feed` gave one) a
 * deviceorientationabsolute event with the current W3C alpha; `feed` changes them (after one handling sample).
 */
async function installFeeder(page: Page) {
  await page.evaluate(() => {
    const w = window as unknown as {
      __vec: number[] | null;
      __alpha: number | null;
      __feed: (v: number[] | null, handled: number[] | null, alpha: number | null) => void;
    };
    w.__vec = null;
    w.__alpha = null;
    const send = (v: number[]) =>
      window.dispatchEvent(
        new DeviceMotionEvent("devicemotion", { accelerationIncludingGravity: { x: v[0]!, y: v[1]!, z: v[2]! }, interval: 20 }),
      );
    w.__feed = (v, handled, alpha) => {
      if (handled) send(handled);
      w.__vec = v;
      w.__alpha = alpha;
    };
    window.setInterval(() => {
      if (w.__alpha !== null)
        window.dispatchEvent(new DeviceOrientationEvent("deviceorientationabsolute", { alpha: w.__alpha, absolute: true }));
      if (w.__vec) send(w.__vec);
    }, 20);
  });
}
/** axe-core on the panel in its working state (the pages themselves are in accessibility.test.ts). */
async function axeViolations(page: Page, selector: string): Promise<string[]> {
  const result = await new AxeBuilder({ page: page as never }).include(selector).analyze();
  return result.violations.map((v) => `${v.id} (${v.impact}) × ${v.nodes.length}: ${v.nodes[0]?.target.join(" ")}`);
}
const feed = (page: Page, v: V3, handled = true, alpha: number | null = null) =>
  page.evaluate(([vec, h, a]) => (window as any).__feed(vec, h, a), [v, handled ? HANDLING : null, alpha] as const);

test(
  "measure on the green: 2.0 % falling right with a 0.3° sensor tilt fills the read form with 2.0 % and 90° after the half turn; a desk says it has no sensor",
  async () => {
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      await page.goto(`${server.url}/read`);
      // The page comes drawn, its read included, before its scripts run: a key pressed on the button then does
      // nothing (CI, 2026-12-04: "Step 1 of 2" never came). Wait for the app.
      await appRunning(page);
      await installFeeder(page);
      // Keyboard: the button is reached and pressed with Enter.
      await page.getByRole("button", { name: "Measure on the green" }).press("Enter");
      await page.getByText("Step 1 of 2").waitFor();
      // 2.0 % falling to the golfer's right: ∂h/∂x = −0.02 (derived: docs/sources.md), top edge toward the hole.
      await feed(page, lying(-0.02, 0), false);
      await page.getByText("Step 2 of 2").waitFor();
      await screenshot(page, "measure-phone-step2");
      expect(await axeViolations(page, 'section[aria-label="Measure on the green"]')).toEqual([]);
      // Half a turn on the same spot: the ground's gradient flips in the phone's frame; the sensor's tilt does not.
      await feed(page, lying(0.02, 0));
      const result = page.getByTestId("measured");
      await result.waitFor();
      expect(await result.textContent()).toMatch(/falls to your right/);
      expect(await result.textContent()).toMatch(/differed by 1\.0\d %/); // 2·tan 0.3° = 1.047 % (hand-computed)
      const slope = Number(await page.getByLabel("Slope (%)").inputValue());
      const fall = Number(await page.getByLabel("Or type degrees").inputValue());
      expect(Math.abs(slope - 2.0)).toBeLessThanOrEqual(0.1);
      expect(Math.abs(fall - 90)).toBeLessThanOrEqual(2);
      await page.waitForURL(/[?&]f=90\b/);
      await screenshot(page, "measure-phone-result");
      expect(browser.unexpected()).toEqual([]);
    } finally {
      await browser.close();
    }

    const desk = await openBrowser(DESKTOP);
    try {
      await desk.page.goto(`${server.url}/read`);
      await appRunning(desk.page);
      await desk.page.getByRole("button", { name: "Measure on the green" }).click();
      await desk.page.getByText("No tilt readings came from this device").waitFor();
      // The form is untouched and still works.
      expect(await desk.page.getByLabel("Slope (%)").isEditable()).toBe(true);
      await screenshot(desk.page, "measure-desk-no-sensor");
      expect(desk.unexpected()).toEqual([]);
    } finally {
      await desk.close();
    }
  },
  SENSOR_TEST_TIMEOUT_MS,
);

/** Signs a new player up in the page and makes them a green; its id. */
async function newPlayerWithGreen(page: Page, name: string): Promise<string> {
  await page.goto(`${server.url}/`);
  return page.evaluate(async (greenName) => {
    const post = async (url: string, body: unknown) => {
      const res = await fetch(url, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify(body) });
      if (!res.ok) throw new Error(`${url}: ${res.status}`);
      return res.json();
    };
    const email = `walk-${Date.now()}-${Math.random().toString(36).slice(2, 7)}@example.test`;
    await post("/api/auth/sign-up/email", { name: "Leena Walker", email, password: "correct-horse-battery", accountType: "player" });
    return (await post("/api/greens", { name: greenName })).id as string;
  }, name);
}

test(
  "map this green: a 3 × 3 walk with synthetic readings is saved as the green's height map",
  async () => {
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      const greenId = await newPlayerWithGreen(page, "Walked green");
      await page.goto(`${server.url}/greens/${greenId}`);
      await page.getByRole("link", { name: "Map this green" }).click();
      await page.getByRole("button", { name: "Start walking" }).waitFor();
      await screenshot(page, "walk-phone-setup");
      await installFeeder(page);
      await page.getByLabel("Apart (m)").fill("1.5");
      // A plane rising 1 % to the right and falling 1.5 % toward the mark: the same gradient at every spot. The phone
      // lies on spot 1 before Start: the walk says "no readings" after 2.5 s without any, and on a loaded machine the
      // round trip from the "Spot 1" heading to a feed could take longer (the race behind a failed run, issue 18).
      const [gx, gy] = [0.01, -0.015];
      await feed(page, lying(gx, gy), false);
      await page.getByRole("button", { name: "Start walking" }).click();
      await page.getByRole("heading", { name: "Spot 1 of 9" }).waitFor();
      await page.getByText("Now turn the phone half a turn").waitFor();
      await feed(page, lying(-gx, -gy));
      for (let k = 2; k <= 9; k++) {
        await page.getByRole("heading", { name: `Spot ${k} of 9` }).waitFor();
        if (k === 5) {
          await screenshot(page, "walk-phone-spot5");
          expect(await axeViolations(page, "#map-by-walking")).toEqual([]);
        }
        await feed(page, lying(gx, gy));
      }
      await page.getByRole("heading", { name: "The walked map" }).waitFor();
      expect(await page.getByText("no spot disagrees with its neighbours").count()).toBe(1);
      await screenshot(page, "walk-phone-review");
      expect(await axeViolations(page, "#map-by-walking")).toEqual([]);
      await page.getByRole("button", { name: "Save as this green's height map" }).click();
      await page.getByTestId("surface-map").waitFor();
      expect(await page.getByRole("region", { name: "The height map" }).textContent()).toMatch(/Walked with a phone: 9 spots/);

      const map = await page.evaluate(async (id) => (await fetch(`/api/greens/${id}/height-map`)).json(), greenId);
      expect(map).toMatchObject({ nx: 3, ny: 3, spacingM: 1.5, source: "walked", spotCount: 9 });
      // Rows north (toward the mark) to south: the north-east corner against the south-west one, h = gx·x + gy·y over
      // 3 m each way = 0.03 − 0.045 = −0.015 m (hand-computed), to 1 mm after the sensor's tilt is taken out.
      expect(map.heightsM[0][2] - map.heightsM[2][0]).toBeCloseTo(-0.015, 3);
      await screenshot(page, "walk-phone-saved");
      browser.allow(refusedStatus(401));
      expect(browser.unexpected()).toEqual([]);
    } finally {
      await browser.close();
    }
  },
  SENSOR_TEST_TIMEOUT_MS,
);

test(
  "map this green by the compass: a 3 × 3 walk with the phone laid a different way at every spot rebuilds the plane",
  async () => {
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      const greenId = await newPlayerWithGreen(page, "Compass green");
      await page.goto(`${server.url}/greens/${greenId}`);
      await page.getByRole("link", { name: "Map this green" }).click();
      await page.getByText("Any way round, by the compass").click();
      await page.getByText(/Compass caution: near metal/).waitFor();
      await screenshot(page, "walk-compass-setup");
      await installFeeder(page);
      await page.getByLabel("Apart (m)").fill("1.5");

      // The plane in the green's frame (x east, y north): falling 1.2 % to the east, rising 1.8 % to the north.
      const [gE, gN] = [-0.012, 0.018];
      // The top edge's heading at each spot (clockwise from north); spot 1's half turn lies at 20 + 180 = 200°.
      const HEADINGS = [20, 75, 140, 200, 250, 310, 5, 95, 170];
      /** What the phone sees with its top edge at H: the plane's gradient along its right edge (cos H, −sin H) and its top edge (sin H, cos H). */
      const seen = (H: number): [number, number] => [
        gE * Math.cos(H * DEG) - gN * Math.sin(H * DEG),
        gE * Math.sin(H * DEG) + gN * Math.cos(H * DEG),
      ];
      /** W3C alpha turns counter-clockwise seen from above, 0 with the top edge north: alpha = 360 − heading. */
      const alphaOf = (H: number) => (360 - H) % 360;
      // On spot 1 before Start, as in the walk above ("no readings" after 2.5 s without any).
      await feed(page, lying(...seen(HEADINGS[0]!)), false, alphaOf(HEADINGS[0]!));
      await page.getByRole("button", { name: "Start walking" }).click();
      await page.getByRole("heading", { name: "Spot 1 of 9" }).waitFor();
      await page.getByText("Now turn the phone half a turn").waitFor();
      await feed(page, lying(...seen(HEADINGS[0]! + 180)), true, alphaOf(HEADINGS[0]! + 180));
      for (let k = 2; k <= 9; k++) {
        await page.getByRole("heading", { name: `Spot ${k} of 9` }).waitFor();
        const H = HEADINGS[k - 1]!;
        await feed(page, lying(...seen(H)), true, alphaOf(H));
        if (k === 2) {
          // The live compass line: 75° is nearest east (a wrong-way alpha would read 285°, west).
          await page.getByText("The phone's top edge points 75° (east).").waitFor();
          await screenshot(page, "walk-compass-spot2");
        }
      }
      await page.getByRole("heading", { name: "The walked map" }).waitFor();
      // Every reading turned to north agrees with its neighbours, although no two spots were read the same way round.
      expect(await page.getByText("no spot disagrees with its neighbours").count()).toBe(1);
      await screenshot(page, "walk-compass-review");
      await page.getByRole("button", { name: "Save as this green's height map" }).click();
      await page.getByTestId("surface-map").waitFor();

      const map = await page.evaluate(async (id) => (await fetch(`/api/greens/${id}/height-map`)).json(), greenId);
      expect(map).toMatchObject({ nx: 3, ny: 3, spacingM: 1.5, source: "walked", spotCount: 9 });
      // The least-squares plane of a 3 × 3 grid: its east slope is the mean of the rows' (east − west)/(2s), its north
      // slope the mean of the columns' (north row − south row)/(2s); rows are stored north to south.
      const h = map.heightsM as number[][];
      const s = 1.5;
      const fitE = [0, 1, 2].reduce((a, r) => a + (h[r]![2]! - h[r]![0]!) / (2 * s), 0) / 3;
      const fitN = [0, 1, 2].reduce((a, c) => a + (h[0]![c]! - h[2]![c]!) / (2 * s), 0) / 3;
      const slopeGap = 100 * Math.hypot(fitE - gE, fitN - gN);
      const fall = (x: number, y: number) => Math.atan2(-x, -y) / DEG;
      const fallGap = Math.abs(((fall(fitE, fitN) - fall(gE, gN) + 540) % 360) - 180);
      console.info(
        `compass walk: rebuilt gradient (${(100 * fitE).toFixed(3)} %, ${(100 * fitN).toFixed(3)} %) vs (−1.200 %, 1.800 %): off by ${slopeGap.toFixed(4)} % of slope, fall line ${fallGap.toFixed(2)}°`,
      );
      // Tolerance: 0.05 % of slope and 1° of fall line (the synthetic headings are exact; what is left is the half
      // turn's second-order remainder of the 0.3° sensor tilt and the slope-squared tilt of the phone's plane).
      expect(slopeGap).toBeLessThan(0.05);
      expect(fallGap).toBeLessThan(1);
      browser.allow(refusedStatus(401));
      expect(browser.unexpected()).toEqual([]);
    } finally {
      await browser.close();
    }
  },
  SENSOR_TEST_TIMEOUT_MS,
);

test(
  "read training's eye check: the measurement waits for a guess, then the guess is compared with it (too steep, about right, the direction's gap)",
  async () => {
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      await page.goto(`${server.url}/train`);
      await page.getByRole("heading", { name: "Check your eye on a real green" }).waitFor();
      await installFeeder(page);
      // Measured first, with no guess written: the page asks for one rather than comparing with nothing.
      await page.getByRole("button", { name: "Measure on the green" }).click();
      await page.getByText("Step 1 of 2").waitFor();
      await feed(page, lying(-0.02, 0), false); // 2.0 % falling to the golfer's right (as in the read page's test)
      await page.getByText("Step 2 of 2").waitFor();
      await feed(page, lying(0.02, 0));
      await page.getByTestId("measured").waitFor();
      await page.getByText("Write down your own reading first, then measure again to compare.").waitFor();
      expect(await page.getByRole("status").filter({ hasText: "Your eye" }).count()).toBe(0);

      // A guess of 2.6 % falling left against the phone's 2.0 % falling right (hand-computed: 0.6 % too steep, 180° off).
      await page.getByLabel("Your slope (%)").fill("2.6");
      await page.getByLabel("It falls").selectOption({ label: "To the left" });
      const compared = page.getByRole("status").filter({ hasText: "Your eye" });
      await compared.filter({ hasText: "180° off" }).waitFor(); // after both fields (in between it reads 0° off)
      expect((await compared.textContent())?.replace(/\s+/g, " ")).toBe(
        "Your eye: 2.6 %, the green falls to your left (side hill). The phone: 2.0 %. You read it 0.6 % too steep, and the direction 180° off.",
      );
      await screenshot(page, "train-eye-check-compared");
      // Within a quarter of a percent is "about right"; falling right and toward the hole is 45° from falling right.
      await page.getByLabel("Your slope (%)").fill("1.9");
      await page.getByLabel("It falls").selectOption({ label: "Right and toward the hole" });
      // (Waited for, not read at once: the re-render follows the input event.)
      await compared.filter({ hasText: /The phone: 2\.0 %\. You read it about right, and the direction 45° off\.$/ }).waitFor();
      // 1.2 % is too flat by 0.8 %.
      await page.getByLabel("Your slope (%)").fill("1.2");
      await compared.filter({ hasText: "You read it 0.8 % too flat, and the direction 45° off." }).waitFor();
      // A guess outside 0–15 % is named beside its field and nothing is compared.
      await page.getByLabel("Your slope (%)").fill("16");
      await page.getByText("Enter a slope from 0 to 15 %.").waitFor();
      await compared.waitFor({ state: "detached" });
      expect(await axeViolations(page, 'section[aria-label="Measure on the green"]')).toEqual([]);
      expect(browser.unexpected()).toEqual([]);
    } finally {
      await browser.close();
    }
  },
  SENSOR_TEST_TIMEOUT_MS,
);
