// At the desk (issue 15), in Chromium on the seeded demo: the coach's view of a player and of the squad, the
// admin screens walked end to end, and on a 390 × 844 phone the main action of each page without scrolling.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_ADMIN, DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import type { TestServer } from "../setup/server";
import { DESKTOP, PHONE, openBrowser, screenshot, startAppServer, type Browser, signInWithForm } from "./harness";

let server: TestServer;
const browsers: Browser[] = [];

beforeAll(async () => {
  server = await startAppServer({ SEED: "1" });
});
afterAll(async () => {
  for (const b of browsers) await b.close();
  await server?.stop();
});

async function signedIn(who: { email: string }, viewport = DESKTOP): Promise<Browser> {
  const b = await openBrowser(viewport);
  browsers.push(b);
  await signInWithForm(b.page, server.url, who.email, DEMO_PASSWORD);
  return b;
}

/** The element is fully inside the first screen of the page (no scrolling). */
async function aboveTheFold(page: Page, name: string | RegExp, role: "button" | "link" = "button") {
  await page.evaluate(() => window.scrollTo(0, 0));
  const box = await page
    .getByRole(role, { name, exact: typeof name === "string" })
    .first()
    .boundingBox();
  expect(box, `${String(name)} is on the page`).not.toBeNull();
  const { height } = page.viewportSize()!;
  expect(box!.y, `${String(name)} starts on screen`).toBeGreaterThanOrEqual(0);
  expect(box!.y + box!.height, `${String(name)} ends above the fold (${height} px)`).toBeLessThanOrEqual(height);
}

test("the coach opens a player: figures with their intervals drawn, where the strokes go, sessions with putts, a note the player reads", async () => {
  const coach = await signedIn(DEMO_COACH);
  const c = coach.page;
  const ivo = DEMO_PLAYERS[0];
  await c.goto(`${server.url}/coach`);
  await c.getByRole("link", { name: ivo.name }).first().click();
  await c.getByRole("heading", { level: 1, name: ivo.name }).waitFor();
  await c.getByRole("heading", { name: `${ivo.name}’s practice` }).waitFor();
  // The make-rate chart draws the 95 % interval (a shaded band) and its whiskers.
  await c.locator(".recharts-area-area").first().waitFor();
  expect(await c.locator(".recharts-errorBar line").count(), "whiskers drawn").toBeGreaterThan(0);
  await expect
    .poll(() => c.getByTestId("strokes-summary").textContent())
    .toMatch(new RegExp(`${ivo.name} loses the most strokes from|${ivo.name} holds their own`));
  await c.getByRole("heading", { name: "Strokes gained per round" }).waitFor();
  // Sessions open onto their putts, read-only.
  await c.getByRole("heading", { name: "Sessions and putts" }).scrollIntoViewIfNeeded();
  await c.locator("section[aria-labelledby='session-putts'] summary").first().click();
  await c.locator("section[aria-labelledby='session-putts'] details[open] ol li").first().waitFor();
  // A note, dated, for the player.
  await c.getByLabel(`A note for ${ivo.name}`, { exact: false }).fill("Hold the finish for two seconds on the 6-footers.");
  await c.getByRole("button", { name: "Save note" }).click();
  await c.getByText("Hold the finish for two seconds on the 6-footers.").waitFor();
  await c.evaluate(() => window.scrollTo(0, 0));
  await screenshot(c, "desk-coach-player-desktop");
  await c.setViewportSize(PHONE);
  await screenshot(c, "desk-coach-player-phone");
  await c.setViewportSize(DESKTOP);

  // The squad view: sortable, filterable, CSV.
  await c.goto(`${server.url}/squads`);
  await c.getByRole("link", { name: /Larkspur juniors/ }).click();
  await c.getByRole("heading", { name: "How the squad is putting" }).waitFor();
  const table = c.locator("table", { has: c.locator("caption", { hasText: "recent practice against their own past" }) });
  await table.locator("tbody tr").first().waitFor();
  expect(await table.locator("tbody tr").count()).toBe(DEMO_PLAYERS.length);
  const names = async () => table.locator("tbody tr th, tbody tr td:first-child").allTextContents();
  await table.getByRole("button", { name: /^Player/ }).click();
  const asc = await names();
  expect(asc).toEqual([...asc].sort((a, b) => a.localeCompare(b)));
  await c.getByLabel("Find a player").fill("leena");
  await expect.poll(async () => (await names()).join("|")).toBe("Leena Park");
  await c.getByLabel("Find a player").fill("");
  const download = c.waitForEvent("download");
  await c.getByRole("button", { name: "Download CSV" }).click();
  expect((await download).suggestedFilename()).toMatch(/^borrowline-larkspur-juniors-overview\.csv$/);
  await screenshot(c, "desk-squad-overview-desktop");
  await c.setViewportSize(PHONE);
  await screenshot(c, "desk-squad-overview-phone");

  // The player reads the note on their ladders page.
  const player = await signedIn(ivo, PHONE);
  await player.page.goto(`${server.url}/ladders/mine`);
  await player.page.getByRole("heading", { name: "Notes from your coach" }).waitFor();
  await player.page.getByText("Hold the finish for two seconds on the 6-footers.").waitFor();
});

test("the admin walks the admin screens: find, change a role, ban and lift, sign out, reset e-mail, owners labelled, audit", async () => {
  const admin = await signedIn(DEMO_ADMIN);
  const a = admin.page;
  await a.getByRole("link", { name: "Admin" }).first().click();
  await a.getByRole("heading", { level: 1, name: "Accounts" }).waitFor();
  await a.getByLabel("Search").fill("leena");
  await a.getByRole("button", { name: "Search" }).click();
  await expect.poll(() => a.getByTestId("admin-user").count()).toBe(1);
  const row = a.getByTestId("admin-user");
  await row.getByLabel("Role of Leena Park").selectOption("coach");
  await a.getByText("Leena Park is now a coach.").waitFor();
  await row.getByLabel("Role of Leena Park").selectOption("player");
  await a.getByText("Leena Park is now a player.").waitFor();
  await row.getByRole("button", { name: "Ban" }).click();
  await a.getByLabel("Reason (they do not see it)").fill("Testing the screens");
  await a.getByRole("button", { name: "Yes, ban" }).click();
  await row.getByText("Banned").waitFor();
  await row.getByRole("button", { name: "Lift ban" }).click();
  await row.getByRole("button", { name: "Ban" }).waitFor();
  await row.getByRole("button", { name: "Sign Leena Park out everywhere" }).click();
  await a.getByRole("button", { name: "Yes, sign out" }).click();
  await a.getByText("Leena Park is signed out on every device.").waitFor();
  await row.getByRole("button", { name: "Send Leena Park a password-reset e-mail" }).click();
  await a.getByRole("button", { name: "Send it" }).click();
  await server.smtpFake!.waitFor((m) => m.to.includes("leena@larkspur.example") && m.subject.includes("Reset"));
  // The admin's own row offers no ban and no role change.
  await a.getByLabel("Search").fill("admin@");
  await a.getByRole("button", { name: "Search" }).click();
  await a.getByText("Admin (cannot be changed here)").waitFor();
  expect(await a.getByTestId("admin-user").getByRole("button", { name: "Ban" }).count()).toBe(0);
  await screenshot(a, "desk-admin-accounts-desktop");

  await a.getByRole("link", { name: "Squads and ladders" }).click();
  await a.getByText(`Owner: ${DEMO_COACH.name} (${DEMO_COACH.email})`).first().waitFor();
  await screenshot(a, "desk-admin-coaching-desktop");
  await a.goto(`${server.url}/squads`);
  await a.getByRole("heading", { name: "Other coaches’ squads" }).waitFor();
  await a.getByText(`Coach: ${DEMO_COACH.name}`).first().waitFor();

  await a.goto(`${server.url}/admin/audit`);
  const list = a.getByTestId("audit-list");
  await list.waitFor();
  const text = await list.textContent();
  for (const words of [
    "sent leena@larkspur.example a password-reset e-mail",
    "signed leena@larkspur.example out everywhere",
    "lifted the ban on leena@larkspur.example",
    "banned leena@larkspur.example (“Testing the screens”)",
    "changed the role of leena@larkspur.example from coach to player",
    "changed the role of leena@larkspur.example from player to coach",
  ]) {
    expect(text).toContain(words);
  }
  expect(text).toContain(DEMO_ADMIN.email);
  await screenshot(a, "desk-admin-audit-desktop");
  await a.setViewportSize(PHONE);
  for (const [path, name] of [
    ["/admin", "desk-admin-accounts-phone"],
    ["/admin/coaching", "desk-admin-coaching-phone"],
    ["/admin/audit", "desk-admin-audit-phone"],
  ] as const) {
    await a.goto(`${server.url}${path}`);
    await a.getByRole("heading", { level: 1 }).waitFor();
    await a.locator("[aria-label^='Loading']").waitFor({ state: "detached" });
    await screenshot(a, name);
  }
});

test("on a 390 × 844 phone the main action of each page shows without scrolling", async () => {
  const player = await signedIn(DEMO_PLAYERS[2], PHONE);
  const p = player.page;
  await p.goto(`${server.url}/practice`);
  await p.getByRole("button", { name: "Start logging" }).waitFor();
  await aboveTheFold(p, "Start logging");
  // The header is as short as its words: the description and the CSV link it leaves out on a phone take no room
  // (their empty paragraph and row left 24 px of blank under the title, 80 px before the form, until 2026-12-05).
  const blankUnderTitle = await p.evaluate(() => {
    const h1 = document.querySelector("main h1")!;
    return h1.closest("header")!.getBoundingClientRect().bottom - h1.getBoundingClientRect().bottom;
  });
  expect(blankUnderTitle).toBeLessThan(1);
  await screenshot(p, "desk-phone-practice");
  await p.getByRole("button", { name: "Start logging" }).click();
  await p.getByRole("button", { name: "Holed" }).waitFor();
  await aboveTheFold(p, "Holed");
  await screenshot(p, "desk-phone-log-putt");
  await p.goto(`${server.url}/ladders/mine`);
  const run = p.getByRole("link", { name: /^(Start|Continue) / }).first();
  await run.click();
  await p.getByRole("button", { name: "Holed" }).waitFor();
  await aboveTheFold(p, "Holed");
  await screenshot(p, "desk-phone-run-rung");
});

/** Elements a Tab reaches (tabindex ≥ 0, or natively focusable) that have no accessible name at all (a rough check: author labels, content, a label element). */
async function unnamedTabStops(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const focusable = document.querySelectorAll<HTMLElement>('a[href], button, input, select, textarea, [tabindex]:not([tabindex="-1"])');
    return [...focusable]
      .filter((el) => !(el as HTMLButtonElement).disabled && el.getClientRects().length > 0)
      .filter((el) => {
        // A drawing (or an "application") is named by its author only, never by the text drawn inside it.
        const authorOnly =
          el instanceof SVGElement || ["application", "img", "figure", "group", "region"].includes(el.getAttribute("role") ?? "");
        if (authorOnly)
          return !(
            el.getAttribute("aria-label")?.trim() ||
            el.getAttribute("aria-labelledby") ||
            el.querySelector(":scope > title")?.textContent?.trim()
          );
        const labelled = el
          .getAttribute("aria-labelledby")
          ?.split(" ")
          .some((id) => (document.getElementById(id)?.textContent ?? "").trim() !== "");
        const labels = (el as HTMLInputElement).labels;
        return !(
          el.getAttribute("aria-label")?.trim() ||
          labelled ||
          el.getAttribute("title")?.trim() ||
          (el.textContent ?? "").trim() ||
          (labels && labels.length > 0) ||
          (el as HTMLInputElement).placeholder
        );
      })
      .map((el) => el.outerHTML.slice(0, 120));
  });
}

test("the make-rates page and the coach's squad charts have no Tab stop without a name (charts are labelled figures)", async () => {
  const player = await signedIn(DEMO_PLAYERS[1]!);
  await player.page.goto(`${server.url}/stats`);
  await player.page.locator("svg.recharts-surface").first().waitFor();
  expect(await unnamedTabStops(player.page)).toEqual([]);
  const coach = await signedIn(DEMO_COACH);
  await coach.page.goto(`${server.url}/coach`);
  await coach.page.locator("svg.recharts-surface").first().waitFor();
  expect(await unnamedTabStops(coach.page)).toEqual([]);
}, 120_000);
