// A coach shares a green with a squad from the green's page; the squad's player sees it, with who shared it, in
// their greens and in the session's green picker (issue 14). Screenshots at phone and desk size.
import { afterAll, beforeAll, expect, test } from "vitest";
import { coachWithSquad } from "../factories/coaching";
import { TEST_PASSWORD } from "../factories/users";
import type { TestServer } from "../setup/server";
import { DESKTOP, PHONE, openBrowser, screenshot, startAppServer, signInWithApi } from "./harness";

let server: TestServer;
beforeAll(async () => {
  server = await startAppServer();
});
afterAll(async () => {
  await server?.stop();
});

test("a coach shares a green with the squad; the player sees it in their greens and the session picker, read-only", async () => {
  const { coach, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const green = (await coach.client.post("/api/greens", { name: "Club green", locationNote: "By the first tee" })).body.id as string;
  await coach.client.post(`/api/greens/${green}/stimp-readings`, { measuredOn: "2026-05-01", stimpFt: 10.5 });

  const desk = await openBrowser(DESKTOP);
  try {
    await signInWithApi(desk.page, server.url, coach.email, TEST_PASSWORD);
    await desk.page.goto(`${server.url}/greens/${green}`);
    const select = desk.page.getByRole("combobox", { name: "Shared with" });
    await select.waitFor();
    await screenshot(desk.page, "green-share-desk-before");
    await select.selectOption({ label: "Tuesday group" });
    await desk.page.getByRole("button", { name: "Share", exact: true }).click();
    await desk.page.getByText("Tuesday group can practise on it now.").waitFor();
    await screenshot(desk.page, "green-share-desk-shared");
  } finally {
    await desk.close();
  }
  const phone = await openBrowser(PHONE);
  try {
    await signInWithApi(phone.page, server.url, coach.email, TEST_PASSWORD);
    await phone.page.goto(`${server.url}/greens/${green}`);
    await phone.page.getByRole("combobox", { name: "Shared with" }).waitFor();
    await screenshot(phone.page, "green-share-phone");
  } finally {
    await phone.close();
  }

  for (const [size, viewport] of [
    ["phone", PHONE],
    ["desk", DESKTOP],
  ] as const) {
    const b = await openBrowser(viewport);
    try {
      await signInWithApi(b.page, server.url, player.email, TEST_PASSWORD);
      await b.page.goto(`${server.url}/greens`);
      const card = b.page.getByRole("list", { name: "Your greens" }).getByRole("link", { name: /Club green/ });
      await card.waitFor();
      expect(await card.textContent()).toContain("Shared with Tuesday group by Test Coach");
      await screenshot(b.page, `greens-shared-${size}`);
      await card.click();
      await b.page
        .getByText(/Shared with Tuesday group by Test Coach/)
        .first()
        .waitFor();
      expect(await b.page.getByRole("button", { name: "Rename" }).count()).toBe(0);
      expect(await b.page.getByRole("heading", { name: "Add a Stimp reading" }).count()).toBe(0);
      await screenshot(b.page, `green-shared-player-${size}`);
      await b.page.goto(`${server.url}/practice`);
      const picker = b.page.getByRole("combobox", { name: "Green", exact: true });
      await picker.waitFor();
      const options = await picker.locator("option").allTextContents();
      expect(options).toContain("Club green, Tuesday group (Stimp 10.5)");
      await screenshot(b.page, `practice-start-shared-green-${size}`);
    } finally {
      await b.close();
    }
  }
});
