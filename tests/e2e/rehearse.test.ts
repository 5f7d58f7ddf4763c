import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { evaluateAttempt } from "../../shared/training";
import { roundPutt } from "../../src/features/training/utils/putt-generator";
import { DESKTOP, PHONE, openBrowser, screenshot as fullPageShot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

const SIDE_HILL = "/rehearse?d=3&s=2&f=90&st=10&rp=0.45";

/**
 * Reads the WebGL canvas back (the scene keeps its drawing buffer) and counts what is on it: distinct colours
 * (5 bits per channel), the share of pixels that are not the sky colour, and pixels near the coral of the line.
 */
async function canvasStats(page: Page) {
  return page.evaluate(async () => {
    const canvas = document.querySelector("canvas");
    if (!canvas) return null;
    const img = new Image();
    img.src = canvas.toDataURL("image/png");
    await img.decode();
    const c = document.createElement("canvas");
    c.width = img.width;
    c.height = img.height;
    const ctx = c.getContext("2d")!;
    ctx.drawImage(img, 0, 0);
    const d = ctx.getImageData(0, 0, c.width, c.height).data;
    const colours = new Set<number>();
    let total = 0;
    let notSky = 0;
    let coral = 0;
    for (let i = 0; i < d.length; i += 4) {
      const [r, g, b] = [d[i]!, d[i + 1]!, d[i + 2]!];
      colours.add(((r >> 3) << 10) | ((g >> 3) << 5) | (b >> 3));
      total++;
      if (Math.abs(r - 0xdc) + Math.abs(g - 0xe6) + Math.abs(b - 0xdf) > 24) notSky++;
      if (Math.abs(r - 0xe0) < 30 && Math.abs(g - 0x5a) < 30 && Math.abs(b - 0x36) < 30) coral++;
    }
    return { width: c.width, height: c.height, colours: colours.size, notSkyShare: notSky / total, coral };
  });
}

/** Full-page screenshots from the top, so the sticky top bar is where a reader expects it. */
async function screenshot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.waitForTimeout(150);
  return fullPageShot(page, name);
}

async function waitForScene(page: Page) {
  await page.locator("canvas").first().waitFor();
  await page.waitForFunction(() => {
    const c = document.querySelector("canvas");
    return !!c && c.width > 100;
  });
  // A few frames for the first render and the Html labels.
  await page.waitForTimeout(600);
}

/** The aim value shown beside the scene, e.g. "15 in left of the hole". */
async function shownAim(page: Page): Promise<{ text: string; m: number }> {
  const text = (await page.locator('dl[aria-label="The read at this pace"] dt:text-is("Aim") + dd').first().textContent()) ?? "";
  const match = /([\d.]+)\s*(in|cm)\s+(left|right)/.exec(text);
  if (!match) return { text, m: 0 };
  const size = Number(match[1]) * (match[2] === "in" ? 0.0254 : 0.01);
  return { text, m: match[3] === "left" ? -size : size };
}

test("the 3D green renders: the canvas holds the green, the line and more than the sky", async () => {
  const browser = await openBrowser(DESKTOP);
  const { page } = browser;
  try {
    await page.goto(`${server.url}${SIDE_HILL}`);
    await waitForScene(page);
    const stats = await canvasStats(page);
    expect(stats).not.toBeNull();
    expect(stats!.width).toBeGreaterThan(300);
    expect(stats!.colours).toBeGreaterThan(40);
    expect(stats!.notSkyShare).toBeGreaterThan(0.3);
    expect(stats!.coral).toBeGreaterThan(50);
    await expect(page.getByText("higher").first().isVisible()).resolves.toBe(true);
    await screenshot(page, "rehearse-desktop");
  } finally {
    await browser.close();
  }
});

test("moving the pace from dying to firm changes the aim: a dying ball needs more borrow", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}${SIDE_HILL}`);
    await waitForScene(page);
    const pace = page.getByLabel("Pace: roll-past if it misses");
    await pace.focus();
    await page.keyboard.press("Home");
    const dying = await shownAim(page);
    await page.keyboard.press("End");
    const firm = await shownAim(page);
    // Falls to the right: both aims are left of the hole, the dying one further.
    expect(dying.m).toBeLessThan(0);
    expect(firm.m).toBeLessThan(0);
    expect(Math.abs(dying.m)).toBeGreaterThan(Math.abs(firm.m) + 0.05);
    await expect(pace.getAttribute("aria-valuetext")).resolves.toMatch(/past the hole/);

    // The URL follows the pace once it rests.
    await page.waitForFunction(() => new URL(location.href).searchParams.get("rp") === "1.5");

    await page.getByLabel("Compare the dying and the firm line").check();
    await page.getByText(/a dying ball needs/).waitFor();
    await page
      .getByText(/^Dying:/)
      .first()
      .waitFor();
    await page
      .getByText(/^Firm:/)
      .first()
      .waitFor();
    // Compare turns the camera to look from above, where the two lines part most clearly.
    await expect(page.getByRole("button", { name: "From above" }).getAttribute("aria-pressed")).resolves.toBe("true");
    await page.waitForTimeout(900);
    await screenshot(page, "rehearse-phone-compare");
    await page.getByRole("button", { name: "Behind the ball" }).click();
    await page.getByRole("button", { name: "Slow motion (×0.25)" }).click();
    await page.waitForTimeout(1500);
    await screenshot(page, "rehearse-phone-behind-replay");
  } finally {
    await browser.close();
  }
});

/** The scene labels on screen (visible ones only), as rectangles. */
async function labelRects(page: Page) {
  return page.evaluate(() =>
    [...document.querySelectorAll<HTMLElement>("[data-scene-label]")]
      .filter((el) => getComputedStyle(el).visibility === "visible")
      .map((el) => {
        const r = el.getBoundingClientRect();
        return { id: el.dataset.sceneLabel!, text: el.textContent ?? "", left: r.left, top: r.top, right: r.right, bottom: r.bottom };
      }),
  );
}

function intersecting(rects: Awaited<ReturnType<typeof labelRects>>) {
  const out: string[] = [];
  for (let i = 0; i < rects.length; i++) {
    for (let j = i + 1; j < rects.length; j++) {
      const a = rects[i]!;
      const b = rects[j]!;
      if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom) out.push(`${a.text} × ${b.text}`);
    }
  }
  return out;
}

/** Pixels of the dying (warm yellow) and firm (deep blue) lines' colours on the canvas. */
async function lineColourPixels(page: Page) {
  return page.evaluate(async () => {
    const canvas = document.querySelector("canvas")!;
    const img = new Image();
    img.src = canvas.toDataURL("image/png");
    await img.decode();
    const c = document.createElement("canvas");
    c.width = img.width;
    c.height = img.height;
    const ctx = c.getContext("2d")!;
    ctx.drawImage(img, 0, 0);
    const d = ctx.getImageData(0, 0, c.width, c.height).data;
    let yellow = 0;
    let blue = 0;
    for (let i = 0; i < d.length; i += 4) {
      const [r, g, b] = [d[i]!, d[i + 1]!, d[i + 2]!];
      if (Math.abs(r - 0xf5) < 30 && Math.abs(g - 0xc8) < 30 && Math.abs(b - 0x42) < 40) yellow++;
      if (Math.abs(r - 0x2f) < 30 && Math.abs(g - 0x5f) < 30 && Math.abs(b - 0xd0) < 40) blue++;
    }
    return { yellow, blue, dpr: window.devicePixelRatio };
  });
}

test("on a phone the view opens behind the ball; in every camera, compare from above included, no two labels overlap and the lines stay visible", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}${SIDE_HILL}`);
    await waitForScene(page);
    await expect(page.getByRole("button", { name: "Behind the ball" }).getAttribute("aria-pressed")).resolves.toBe("true");
    const seen: Record<string, string[]> = {};
    const check = async (name: string) => {
      await page.waitForTimeout(900);
      const rects = await labelRects(page);
      seen[name] = rects.map((r) => r.text);
      expect(intersecting(rects), `${name}: ${JSON.stringify(rects)}`).toEqual([]);
      // Labels stay inside the scene.
      const box = (await page.locator("canvas").first().boundingBox())!;
      for (const r of rects) {
        expect(r.left, `${name} ${r.text}`).toBeGreaterThanOrEqual(box.x - 0.5);
        expect(r.right, `${name} ${r.text}`).toBeLessThanOrEqual(box.x + box.width + 0.5);
      }
    };
    await check("behind");
    for (const v of ["From above", "Free view", "Behind the ball"]) {
      await page.getByRole("button", { name: v }).click();
      await check(v);
    }
    await page.getByLabel("Compare the dying and the firm line").check();
    await check("compare from above");
    // The three aim labels of the comparison are all shown, apart.
    expect(seen["compare from above"]!.filter((t) => /^(Dying|Firm|Your pace)/.test(t))).toHaveLength(3);
    // Both lines are drawn thick enough to see: each covers many pixels (a 5.5 px line over ~1.5 m of path).
    const px = await lineColourPixels(page);
    expect(px.yellow, JSON.stringify(px)).toBeGreaterThan(400 * px.dpr);
    expect(px.blue, JSON.stringify(px)).toBeGreaterThan(400 * px.dpr);
    for (const v of ["Behind the ball", "Free view"]) {
      await page.getByRole("button", { name: v }).click();
      await check(`compare ${v}`);
    }
    await screenshot(page, "rehearse-phone-compare-free");
  } finally {
    await browser.close();
  }
});

test("read training's labels never overlap, before and after the reveal, in every camera", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/train?level=club&seed=42&n=0`);
    await waitForScene(page);
    for (const stage of ["before", "after"]) {
      if (stage === "after") await page.getByRole("button", { name: "Reveal the line" }).click();
      for (const v of ["Behind the ball", "From above", "Free view"]) {
        await page.getByRole("button", { name: v }).click();
        await page.waitForTimeout(900);
        const rects = await labelRects(page);
        expect(intersecting(rects), `${stage} ${v}: ${JSON.stringify(rects)}`).toEqual([]);
        expect(
          rects.some((r) => r.text.includes("Your aim")),
          `${stage} ${v}`,
        ).toBe(true);
      }
    }
  } finally {
    await browser.close();
  }
});

test("without WebGL the page says so and shows the putt from above", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.addInitScript(() => {
      const original = HTMLCanvasElement.prototype.getContext;
      HTMLCanvasElement.prototype.getContext = function (this: HTMLCanvasElement, type: string, ...rest: unknown[]) {
        if (/webgl/i.test(type)) return null;
        return (original as (...a: unknown[]) => unknown).call(this, type, ...rest);
      } as typeof original;
    });
    await page.goto(`${server.url}${SIDE_HILL}`);
    await page.getByText(/WebGL is not available/).waitFor();
    await expect(
      page
        .getByRole("img", { name: /seen from above/ })
        .first()
        .isVisible(),
    ).resolves.toBe(true);
    expect(await page.locator("canvas").count()).toBe(0);
    // The numbers still work without the 3D view.
    expect((await shownAim(page)).m).toBeLessThan(0);
    await screenshot(page, "rehearse-phone-no-webgl");
  } finally {
    await browser.close();
  }
});

test("a training round is scored: set the aim and the pace, reveal, and the score matches the shared scoring", async () => {
  const browser = await openBrowser(DESKTOP);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/train?level=club&seed=42&n=0`);
    await waitForScene(page);
    // A tap on the green right of the line moves the aim spot to the right.
    const aimShown = page
      .locator("output")
      .filter({ hasText: /of the hole|at the hole/ })
      .first();
    await expect(aimShown.textContent()).resolves.toBe("straight at the hole");
    await page.locator("canvas").first().scrollIntoViewIfNeeded();
    const box = (await page.locator("canvas").first().boundingBox())!;
    await page.mouse.click(box.x + box.width * 0.72, box.y + box.height * 0.8);
    await page.waitForFunction(() => [...document.querySelectorAll("output")].some((o) => /right of the hole/.test(o.textContent ?? "")));
    // Arrow keys on the green move it too (one inch per press).
    const before = (await aimShown.textContent()) ?? "";
    await page.getByLabel(/^The green\. Drag your aim spot/).focus();
    await page.keyboard.press("ArrowLeft");
    await page.keyboard.press("ArrowLeft");
    await expect(aimShown.textContent()).resolves.not.toBe(before);

    await page.getByLabel("Aim offset (in)").fill("10");
    await page.getByLabel("Side of the hole").selectOption("left");
    await page.getByLabel("Flat-putt length (ft)").fill("12");
    await page.getByRole("button", { name: "Reveal the line" }).click();
    const score = page.getByLabel(/^Score \d+ out of 100$/);
    await score.waitFor();
    const shown = Number(/Score (\d+)/.exec((await score.getAttribute("aria-label")) ?? "")![1]);
    const expected = evaluateAttempt(roundPutt("club", 42, 0), { aimOffsetM: -0.254, flatPuttLengthM: 12 * 0.3048 });
    if (!expected.ok) throw new Error("cannot stop");
    expect(shown).toBe(expected.score);
    await page.getByText(/sign in to keep a history/i).waitFor();
    await page.waitForTimeout(800);
    await screenshot(page, "train-desktop-revealed");
  } finally {
    await browser.close();
  }
});

test("a signed-in player's reads are kept and charted", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/sign-up?next=${encodeURIComponent("/train?level=gentle&seed=7&n=0")}`);
    await page.getByLabel("Name").fill("Ivy Green");
    await page.getByLabel("E-mail").fill("ivy@example.test");
    await page.getByLabel("Password").fill("a-good-long-password");
    await page.getByText("I am a player").click();
    await page.getByRole("button", { name: /create/i }).click();
    await page.waitForURL(/\/train/);
    for (const aim of ["4", "8"]) {
      await waitForScene(page);
      await page.getByLabel("Aim offset (in)").fill(aim);
      await page.getByRole("button", { name: "Reveal the line" }).click();
      await page.getByText("Kept in your history.").waitFor();
      await page.getByRole("button", { name: "Next putt" }).click();
    }
    await page.getByText(/2 reads kept/).waitFor();
    await page.getByRole("img", { name: /Score of each read/ }).waitFor();
    await page.getByText("Your reading over time").scrollIntoViewIfNeeded();
    await screenshot(page, "train-phone-history");
  } finally {
    await browser.close();
  }
});

/** Expected refusals (Chromium logs each as a failed resource); any other console error fails the test. */
