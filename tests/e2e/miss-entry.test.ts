// Issue 14, item 1: every order of side, finish and length reaches the server as the screen showed it.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, openBrowser, screenshot, startAppServer } from "./harness";
import type { TestServer } from "../setup/server";

const INCH_M = 0.0254;

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

type Stored = { holed: boolean; missSide: "left" | "right" | null; missLengthM: number | null; createdAt: string };

async function storedPutts(page: Page, sessionId: string): Promise<Stored[]> {
  const res = await page.request.get(`${server.url}/api/sessions/${sessionId}/putts`);
  expect(res.status()).toBe(200);
  const { items } = (await res.json()) as { items: Stored[] };
  return items.sort((a, b) => a.createdAt.localeCompare(b.createdAt));
}

/** What the Missed button says, read as the putt the player meant: "left, 12 in long" → side and signed metres. */
function meant(summary: string): { missSide: string | null; missLengthM: number | null } {
  const side = /\b(left|right)\b/.exec(summary)?.[1] ?? null;
  const len = /(\d+) in (short|long)/.exec(summary);
  return { missSide: side, missLengthM: len ? Number(len[1]) * INCH_M * (len[2] === "short" ? -1 : 1) : null };
}

type Step = "side" | "finish" | "length";
const PERMUTATIONS: Step[][] = [
  ["side", "finish", "length"],
  ["side", "length", "finish"],
  ["finish", "side", "length"],
  ["finish", "length", "side"],
  ["length", "side", "finish"],
  ["length", "finish", "side"],
];

test("on a phone, every order of side, finish and length is stored as the Missed button said", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  try {
    await page.goto(`${server.url}/sign-up`);
    await page.getByLabel("Name").fill("Ona Fairway");
    await page.getByLabel("E-mail").fill("ona@example.test");
    await page.getByLabel("Password").fill("a-good-long-password");
    await page.getByText("I am a player").click();
    await page.getByRole("button", { name: /create/i }).click();
    await page.getByText("Signed in as").first().waitFor({ state: "attached" });
    await page.goto(`${server.url}/practice`);
    await page.getByRole("button", { name: "Start logging" }).click();
    await page.waitForURL(/\/practice\/[0-9a-f-]{36}$/);
    const sessionId = /\/practice\/([0-9a-f-]{36})$/.exec(page.url())![1]!;

    const miss = page.getByRole("region", { name: "A miss" });
    const missed = miss.getByRole("button", { name: /^Missed/ });
    const summaries: string[] = [];

    const cases = PERMUTATIONS.flatMap((order, i) => [
      { order, side: i % 2 ? "Left" : "Right", finish: i % 3 ? "Short" : "Long", length: ["4", "12", "24", "36"][i % 4]! },
      { order, side: i % 2 ? "Right" : "Left", finish: i % 3 ? "Long" : "Short", length: ["36", "24", "12", "4"][i % 4]! },
    ]);
    for (const c of cases) {
      for (const step of c.order) {
        const chip = miss.getByRole("button", { name: step === "side" ? c.side : step === "finish" ? c.finish : c.length, exact: true });
        if (step === "length" && (await chip.isDisabled())) continue; // no length before a finish: the chips say so
        await chip.click();
      }
      // A length tapped too early is tapped again once the finish is chosen, as a golfer would.
      if (!(await missed.isEnabled())) await miss.getByRole("button", { name: c.length, exact: true }).click();
      const summary = ((await missed.textContent()) ?? "").replace(/^Missed\s*/, "").trim();
      expect(summary).toBe(`${c.side.toLowerCase()}, ${c.length} in ${c.finish.toLowerCase()}`);
      summaries.push(summary);
      await missed.click();
    }

    // Left, then Long, then Missed: the button waits for the length instead of storing a miss without its finish.
    await miss.getByRole("button", { name: "Left", exact: true }).click();
    await miss.getByRole("button", { name: "Long", exact: true }).click();
    await expect(missed.textContent()).resolves.toContain("left, long");
    expect(await missed.isDisabled()).toBe(true);
    await page.getByText("Pick how far long it finished").waitFor();
    await screenshot(page, "miss-entry-needs-length-phone");
    // Taking the finish back logs the side alone, as the button then says.
    await miss.getByRole("button", { name: "Long", exact: true }).click();
    summaries.push(((await missed.textContent()) ?? "").replace(/^Missed\s*/, "").trim());
    expect(summaries.at(-1)).toBe("left");
    await missed.click();
    // A bare miss.
    summaries.push("");
    await missed.click();

    await page.waitForLoadState("networkidle");
    await expect.poll(async () => (await storedPutts(page, sessionId)).length).toBe(summaries.length);
    const stored = await storedPutts(page, sessionId);
    stored.forEach((p, i) => {
      const want = meant(summaries[i]!);
      expect(p.holed, summaries[i]).toBe(false);
      expect(p.missSide, summaries[i]).toBe(want.missSide);
      if (want.missLengthM === null) expect(p.missLengthM, summaries[i]).toBeNull();
      else expect(p.missLengthM, summaries[i]).toBeCloseTo(want.missLengthM, 6);
    });
    // The list says it the same way.
    const list = page.getByRole("list", { name: "Putts, newest first" });
    await expect(
      list
        .getByRole("listitem")
        .nth(summaries.length - 3)
        .textContent(),
    ).resolves.toContain(`Missed ${summaries[2]}`);
  } finally {
    await browser.close();
  }
});
