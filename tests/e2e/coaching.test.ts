// Coaching in Chromium, two people side by side: a coach (desk) and a player (phone), each in a browser of their own.
import { afterAll, beforeAll, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { DESKTOP, PHONE, openBrowser, screenshot, startAppServer, type Browser } from "./harness";
import type { TestServer } from "../setup/server";

let server: TestServer;
let coach: Browser;
let player: Browser;
/** The e-mail's links use the server's public origin (localhost), which may differ from server.url (127.0.0.1): cookies follow the origin. */
let playerOrigin = "";

const COACH = { name: "Hallie Brookes", email: "hallie.coach@example.test", password: "coach-password-long" };
const PLAYER = { name: "Tobin Reyes", email: "tobin.player@example.test", password: "player-password-long" };
const SQUAD = "Thursday group";
const LADDER = "Three short rungs";

beforeAll(async () => {
  server = await startAppServer();
  coach = await openBrowser(DESKTOP);
  player = await openBrowser(PHONE);
});
afterAll(async () => {
  await coach?.close();
  await player?.close();
  await server?.stop();
});

/** Expected refusals (Chromium logs each as a failed resource); any other console error fails the test. */

async function signUpCoach(page: Page) {
  await page.goto(`${server.url}/sign-up`);
  await page.getByLabel("Name").fill(COACH.name);
  await page.getByLabel("E-mail").fill(COACH.email);
  await page.getByLabel("Password").fill(COACH.password);
  await page.getByText("I am a coach").click();
  await page.getByRole("button", { name: "Create account" }).click();
  await page.getByText("Signed in as").first().waitFor();
}

test("a coach creates a squad and invites a player by e-mail; the player follows the link, signs up and joins", async () => {
  const c = coach.page;
  await signUpCoach(c);

  await c.goto(`${server.url}/squads`);
  await c.getByLabel("Squad name").fill(SQUAD);
  await c.getByLabel("Description (optional)").fill("Short-game group, Thursday evenings");
  await c.getByRole("button", { name: "Create squad" }).click();
  await c.getByRole("heading", { level: 1, name: SQUAD }).waitFor();
  await c.getByLabel("E-mail addresses").fill(PLAYER.email);
  await c.getByRole("button", { name: "Send invitations" }).click();
  await c.getByText("Invitation sent").waitFor();
  await c.getByText("Waiting").first().waitFor();
  await screenshot(c, "coaching-squad-invited-desktop");

  // The e-mail arrives at the SMTP fake with the link.
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(PLAYER.email) && m.subject === `Join ${SQUAD} on Borrowline`);
  const link = mail.text.match(/https?:\/\/\S+\/join\/[A-Za-z0-9_-]{43}/)?.[0];
  expect(link, "a join link in the invitation e-mail").toBeDefined();

  // The player, on a phone in another browser, follows it.
  const p = player.page;
  playerOrigin = new URL(link!).origin;
  await p.goto(link!);
  await p.getByRole("heading", { level: 1, name: SQUAD }).waitFor();
  await expect(p.getByText(COACH.name).first().isVisible()).resolves.toBe(true);
  await screenshot(p, "coaching-join-preview-phone");
  await p.getByRole("button", { name: "Create your player account" }).click();
  await expect(p.getByLabel("E-mail").inputValue()).resolves.toBe(PLAYER.email);
  await p.getByLabel("Name").fill(PLAYER.name);
  await p.getByLabel("Password").fill(PLAYER.password);
  await p.getByRole("button", { name: "Create account" }).click();
  // The e-mailed link proves the address: no "confirm your e-mail" step before joining.
  await p.getByRole("button", { name: `Join ${SQUAD}` }).waitFor();
  await expect(p.getByText("Confirm your e-mail first").count()).resolves.toBe(0);
  await p.getByRole("button", { name: `Join ${SQUAD}` }).click();
  await p.getByText(`You are in ${SQUAD}`).waitFor();
  await screenshot(p, "coaching-joined-phone");

  // The coach sees the player in the squad.
  await c.reload();
  // The member list and the squad overview table both link the player (the table once its figures arrive).
  await c.getByRole("link", { name: PLAYER.name }).first().waitFor();
  await c.getByText("Joined", { exact: true }).waitFor();
  await screenshot(c, "coaching-squad-member-desktop");
});

test("the coach builds a three-rung ladder and gives it to the squad; the player runs it to the top; the dashboard shows it completed", async () => {
  const c = coach.page;
  await c.goto(`${server.url}/ladders/new`);
  await c.getByLabel("Ladder name").fill(LADDER);
  const rung1 = c.getByRole("listitem", { name: "Rung 1" });
  await rung1.getByLabel("Balls").fill("3");
  await rung1.getByLabel("Holed needed").fill("2");
  await c.getByRole("button", { name: "Add a rung" }).click();
  await c.getByRole("button", { name: "Add a rung" }).click();
  const preview = c.getByRole("region", { name: "Preview for the player" });
  await preview.getByText("Hole 2 of 3 from 3 ft").waitFor();
  await preview.getByText("Hole 2 of 3 from 5 ft").waitFor();
  await screenshot(c, "coaching-ladder-builder-desktop");
  await c.getByRole("button", { name: "Save ladder" }).click();

  await c.getByRole("heading", { level: 1, name: LADDER }).waitFor();
  await c.getByRole("button", { name: `Give ${LADDER}` }).click();
  await c.getByText("Given to 1 player").waitFor();
  await expect(c.getByRole("status").filter({ hasText: "Given to 1 player" }).getByText(PLAYER.name).isVisible()).resolves.toBe(true);
  await screenshot(c, "coaching-ladder-assigned-desktop");

  // The player finds it under My ladders and runs it: two holed on each of three rungs.
  const p = player.page;
  await p.goto(`${playerOrigin}/ladders/mine`);
  await p.getByRole("heading", { name: LADDER }).waitFor();
  await screenshot(p, "coaching-my-ladders-phone");
  await p.getByRole("link", { name: `Start ${LADDER}` }).click();
  const rung = p.getByRole("region", { name: "Current rung" });
  await rung.getByText("Rung 1 of 3").waitFor();
  await screenshot(p, "coaching-run-start-phone");
  const holed = p.getByRole("button", { name: "Holed", exact: true });
  await holed.click();
  await holed.click();
  await p.getByText("Rung passed — on to 4 ft").waitFor();
  await rung.getByText("Rung 2 of 3").waitFor();
  await screenshot(p, "coaching-run-passed-phone");
  for (let i = 0; i < 4; i++) await holed.click();
  await p.getByRole("heading", { name: "Ladder completed" }).waitFor();
  await p.getByText("Every putt saved").waitFor();
  await screenshot(p, "coaching-run-completed-phone");

  // The state is the server's: it survives a reload.
  await p.reload();
  await p.getByRole("heading", { name: "Ladder completed" }).waitFor();

  await c.goto(`${server.url}/coach`);
  const row = c.getByRole("row").filter({ hasText: PLAYER.name }).filter({ hasText: LADDER });
  await row.getByText("Completed").waitFor();
  await expect(row.getByText("3 / 3").isVisible()).resolves.toBe(true);
  await screenshot(c, "coaching-dashboard-desktop");
});
