// Coaching set-ups through the real API: a coach with a squad, players who joined by their invitation e-mail.
import { eq } from "drizzle-orm";
import { expect } from "vitest";
import { user } from "../../server/db/schema";
import type { LadderInput } from "../../shared/schemas/ladders";
import type { HttpClient } from "../setup/http";
import type { TestServer } from "../setup/server";
import { signedUpClient } from "./users";

export type Person = { client: HttpClient; email: string; id: string };

/** The token from an invitation e-mail sent to `email`, skipping the messages already `seen` (by id). */
export async function invitationTokenFor(server: TestServer, email: string, seen: ReadonlySet<string> = new Set()): Promise<string> {
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(email) && m.subject.startsWith("Join ") && !seen.has(m.id));
  const token = mail.text.match(/\/join\/([A-Za-z0-9_-]{43})\b/)?.[1];
  expect(token, "an invitation link in the e-mail").toBeDefined();
  return token!;
}

export async function createSquad(coach: HttpClient, name = "Tuesday group"): Promise<string> {
  const res = await coach.post("/api/squads", { name });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

/** Marks the account's e-mail as confirmed, as following the verification link does (accepting an invitation needs it). */
export async function confirmEmail(server: TestServer, email: string): Promise<void> {
  await server.database.db.update(user).set({ emailVerified: true }).where(eq(user.email, email));
}

/** Invites a freshly signed-up player (e-mail confirmed) to the squad and accepts through the e-mailed token. */
export async function joinedPlayer(server: TestServer, coach: HttpClient, squadId: string, name = "Squad Player"): Promise<Person> {
  const player = await signedUpClient(server, "player", name);
  await confirmEmail(server, player.email);
  const invited = await coach.post(`/api/squads/${squadId}/invitations`, { email: player.email });
  expect(invited.status).toBe(201);
  const token = await invitationTokenFor(server, player.email);
  const accepted = await player.client.post(`/api/invitations/${token}/accept`);
  expect(accepted.status).toBe(200);
  return player;
}

export async function coachWithSquad(server: TestServer, players = 1) {
  const coach = await signedUpClient(server, "coach", "Test Coach");
  const squadId = await createSquad(coach.client);
  const members: Person[] = [];
  for (let i = 0; i < players; i++) members.push(await joinedPlayer(server, coach.client, squadId, `Player ${i + 1}`));
  return { coach, squadId, members };
}

/** Three rungs, one of each pass rule shape: 2 of 3, then 2 in a row of 4, then 1 of 2. */
export const THREE_RUNGS: LadderInput = {
  name: "Test ladder",
  description: "Three short rungs",
  failRule: "drop-one",
  rungs: [
    { distanceM: 1, balls: 3, passRule: { kind: "make", made: 2 } },
    { distanceM: 2, balls: 4, passRule: { kind: "in-a-row", count: 2 }, breakType: "uphill" },
    { distanceM: 3, balls: 2, passRule: { kind: "make", made: 1 } },
  ],
};

export async function createLadder(coach: HttpClient, ladder: LadderInput = THREE_RUNGS): Promise<string> {
  const res = await coach.post("/api/ladders", ladder);
  expect(res.status).toBe(201);
  return res.body.id as string;
}
