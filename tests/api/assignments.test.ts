import crypto from "node:crypto";
import { afterAll, beforeAll, expect, test } from "vitest";
import { and, asc, eq, inArray, isNotNull } from "drizzle-orm";
import { replay } from "../../shared/ladder-engine";
import { seedCoaching } from "../../server/db/seed-coaching";
import { DEMO_LADDERS } from "../../server/db/seed-data";
import { ladderAssignments, ladders, practiceSessions, putts } from "../../server/db/schema";
import { THREE_RUNGS, coachWithSquad, createLadder, createSquad } from "../factories/coaching";
import { signedUpClient } from "../factories/users";
import type { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

const H = true;
const M = false;
const ONE_BALL = {
  name: "One ball",
  failRule: "repeat" as const,
  rungs: [{ distanceM: 1.5, balls: 1, passRule: { kind: "make" as const, made: 1 } }],
};

async function assign(coach: HttpClient, ladderId: string, body: object): Promise<string[]> {
  const res = await coach.post(`/api/ladders/${ladderId}/assignments`, body);
  expect(res.status).toBe(201);
  return res.body.assignments.map((a: { id: string }) => a.id);
}

async function putt(player: HttpClient, assignmentId: string, holed: boolean, extra: object = {}) {
  return player.post(`/api/assignments/${assignmentId}/putts`, { holed, ...extra });
}

test("a coach builds a three-rung ladder, assigns it to a squad, the player runs it to the top and the coach sees it completed", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 2);
  const [runner, idle] = members as [(typeof members)[0], (typeof members)[0]];
  const ladderId = await createLadder(coach.client);

  const res = await coach.client.post(`/api/ladders/${ladderId}/assignments`, { squadId, dueDate: "2099-06-30" });
  expect(res.status).toBe(201);
  expect(res.body.assignments).toHaveLength(2);
  const mine = res.body.assignments.find((a: { player: { id: string } }) => a.player.id === runner.id);
  expect(mine).toMatchObject({
    status: "assigned",
    dueDate: "2099-06-30",
    overdue: false,
    squadId,
    ladder: { name: "Test ladder", sourceLadderId: ladderId, failRule: "drop-one", rungs: THREE_RUNGS.rungs },
    currentRung: THREE_RUNGS.rungs[0],
    progress: { rungIndex: 0, puttsTaken: 0, completed: false },
  });
  const id = mine.id as string;

  // Each player is e-mailed a link to run it.
  const mail = await server.smtpFake!.waitFor((m) => m.to.includes(runner.email) && m.subject.startsWith("You have a new ladder"));
  expect(mail.subject).toBe("You have a new ladder: Test ladder");
  expect(new URL(mail.text.match(/https?:\/\/\S+\/ladders\/run\/\S+/)![0]).pathname).toBe(`/ladders/run/${id}`);
  await server.smtpFake!.waitFor((m) => m.to.includes(idle.email) && m.subject.startsWith("You have a new ladder"));

  // Rung 1 (2 of 3): H M H passes.
  for (const o of [H, M]) expect((await putt(runner.client, id, o)).status).toBe(201);
  let r = await putt(runner.client, id, H);
  expect(r.body.progress).toMatchObject({ rungIndex: 1, lastResult: "passed", attempts: 1 });
  expect(r.body.currentRung).toEqual(THREE_RUNGS.rungs[1]);
  expect(r.body.status).toBe("in-progress");
  // Rung 2 (2 in a row of 4): M H M cannot make a run of two with one ball left: fails, drops one rung.
  await putt(runner.client, id, M);
  await putt(runner.client, id, H, { clientId: crypto.randomUUID() });
  r = await putt(runner.client, id, M, { missSide: "left", missLengthM: -0.4 });
  expect(r.body.progress).toMatchObject({ rungIndex: 0, lastResult: "failed", attempts: 2, bestRungIndex: 1 });
  // Back up: H H, then H H on rung 2, then M H on rung 3 completes.
  for (const o of [H, H, H, H, M]) expect((await putt(runner.client, id, o)).status).toBe(201);
  r = await putt(runner.client, id, H);
  expect(r.status).toBe(201);
  expect(r.body).toMatchObject({ status: "completed", currentRung: null, completedAt: expect.any(String) });
  expect(r.body.progress).toMatchObject({ completed: true, rungIndex: 2, attempts: 5, puttsTaken: 12 });
  expect(r.body.progress.history.map((a: { result: string }) => a.result)).toEqual(["passed", "failed", "passed", "passed", "passed"]);
  expect(r.body.putts).toHaveLength(12);
  const outcomes = [H, M, H, M, H, M, H, H, H, H, M, H];
  expect(r.body.progress).toEqual(replay(THREE_RUNGS, outcomes));

  // It survives a reload: the state is recomputed from the stored putts.
  const reloaded = await runner.client.get(`/api/assignments/${id}`);
  expect(reloaded.status).toBe(200);
  expect(reloaded.body).toEqual(r.body);

  // A completed ladder refuses more putts.
  const more = await putt(runner.client, id, H);
  expect(more.status).toBe(409);
  expect((await runner.client.get(`/api/assignments/${id}`)).body.progress.puttsTaken).toBe(12);

  // The player's list and the coach's views.
  const list = await runner.client.get("/api/assignments");
  expect(list.body.assignments.map((a: { id: string; status: string }) => [a.id, a.status])).toEqual([[id, "completed"]]);
  const players = await coach.client.get("/api/coach/players");
  expect(players.status).toBe(200);
  const row = players.body.players.find((p: { id: string }) => p.id === runner.id);
  expect(row.squads).toEqual([{ id: squadId, name: "Tuesday group" }]);
  expect(row.assignments).toEqual([
    expect.objectContaining({
      id,
      ladderName: "Test ladder",
      status: "completed",
      rungsPassed: 3,
      rungReached: 3,
      rungsTotal: 3,
      attempts: 5,
      puttsTaken: 12,
      dueDate: "2099-06-30",
      lastActivityAt: expect.any(String),
    }),
  ]);
  const idleRow = players.body.players.find((p: { id: string }) => p.id === idle.id);
  expect(idleRow.assignments[0]).toMatchObject({ status: "assigned", rungsPassed: 0, rungReached: 1, puttsTaken: 0, lastActivityAt: null });

  const squadView = await coach.client.get(`/api/coach/squads/${squadId}/assignments`);
  expect(squadView.body.assignments.map((a: { status: string }) => a.status).sort()).toEqual(["assigned", "completed"]);
  const profile = await coach.client.get(`/api/coach/players/${runner.id}`);
  expect(profile.status).toBe(200);
  expect(profile.body.player).toEqual({ id: runner.id, name: "Player 1", email: runner.email });
  expect(profile.body.squads).toEqual([expect.objectContaining({ id: squadId, name: "Tuesday group" })]);
  expect(profile.body.assignments[0].progress.history).toHaveLength(5);
  // The coach reads the assignment too, but only the player runs it.
  expect((await coach.client.get(`/api/assignments/${id}`)).status).toBe(200);
  expect((await putt(coach.client, id, H)).status).toBe(404);
});

test("ladder putts are practice putts: rows in putts with assignment_id, rung_index and the rung's distance, in one session", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const [id] = await assign(coach.client, await createLadder(coach.client), { squadId });
  for (const o of [H, H, M, H, H]) await putt(player.client, id!, o);
  const db = server.database.db;
  const rows = await db.select().from(putts).where(eq(putts.assignmentId, id!)).orderBy(asc(putts.createdAt));
  expect(rows.map((p) => p.rungIndex)).toEqual([0, 0, 1, 1, 1]);
  expect(rows.map((p) => p.distanceM)).toEqual([1, 1, 2, 2, 2]);
  expect(rows.map((p) => p.holed)).toEqual([H, H, M, H, H]);
  expect(rows.map((p) => p.breakType)).toEqual([null, null, "uphill", "uphill", "uphill"]);
  expect(new Set(rows.map((p) => p.playerId))).toEqual(new Set([player.id]));
  const sessionIds = new Set(rows.map((p) => p.sessionId));
  expect(sessionIds.size).toBe(1);
  const [session] = await db.select().from(practiceSessions).where(eq(practiceSessions.id, rows[0]!.sessionId));
  expect(session).toMatchObject({ playerId: player.id, date: new Date().toISOString().slice(0, 10), notes: "Ladder: Test ladder" });
  const [assignment] = await db.select().from(ladderAssignments).where(eq(ladderAssignments.id, id!));
  expect(assignment).toMatchObject({ sessionId: session!.id, status: "in-progress" });
  expect((await player.client.get(`/api/assignments/${id}`)).body.sessionId).toBe(session!.id);

  // On another day the next ladder putt opens a new session; the old one keeps its putts.
  await db.update(practiceSessions).set({ date: "2000-01-01" }).where(eq(practiceSessions.id, session!.id));
  await putt(player.client, id!, M);
  const after = await db.select().from(putts).where(eq(putts.assignmentId, id!)).orderBy(asc(putts.createdAt));
  expect(after).toHaveLength(6);
  expect(after.at(-1)!.sessionId).not.toBe(session!.id);
  expect(after.slice(0, 5).every((p) => p.sessionId === session!.id)).toBe(true);
});

test("POST /api/assignments/:id/putts with a repeated clientId stores the putt once and answers the same state", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const ladderId = await createLadder(coach.client);
  const [a, b] = [...(await assign(coach.client, ladderId, { squadId })), ...(await assign(coach.client, ladderId, { squadId }))];
  const clientId = crypto.randomUUID();
  const first = await putt(player.client, a!, H, { clientId });
  expect(first.status).toBe(201);
  const retry = await putt(player.client, a!, H, { clientId });
  expect(retry.status).toBe(200);
  expect(retry.body).toEqual(first.body);
  const stored = await server.database.db
    .select()
    .from(putts)
    .where(and(eq(putts.playerId, player.id), eq(putts.clientId, clientId)));
  expect(stored).toHaveLength(1);
  expect(first.body.progress.puttsTaken).toBe(1);
  const elsewhere = await putt(player.client, b!, H, { clientId });
  expect(elsewhere.status).toBe(409);
  expect((await player.client.get(`/api/assignments/${b}`)).body.progress.puttsTaken).toBe(0);
});

test("DELETE /api/assignments/:id/putts/last takes back the last putt, reopening a completed ladder", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const [id] = await assign(coach.client, await createLadder(coach.client, ONE_BALL), { squadId });
  expect((await putt(player.client, id!, M)).body.progress).toMatchObject({ lastResult: "failed", attempts: 1 });
  const done = await putt(player.client, id!, H);
  expect(done.body.status).toBe("completed");
  expect((await putt(player.client, id!, H)).status).toBe(409);

  const undone = await player.client.delete(`/api/assignments/${id}/putts/last`);
  expect(undone.status).toBe(200);
  expect(undone.body).toMatchObject({ status: "in-progress", completedAt: null });
  expect(undone.body.progress).toMatchObject({ completed: false, puttsTaken: 1, attempts: 1 });
  expect(undone.body.putts.map((p: { holed: boolean }) => p.holed)).toEqual([M]);
  const left = await server.database.db.select().from(putts).where(eq(putts.assignmentId, id!));
  expect(left.map((p) => p.holed)).toEqual([M]);

  expect((await player.client.delete(`/api/assignments/${id}/putts/last`)).body.status).toBe("assigned");
  expect((await player.client.delete(`/api/assignments/${id}/putts/last`)).status).toBe(404);
  expect((await putt(player.client, id!, H)).body.status).toBe("completed");
});

test("POST /api/ladders/:id/assignments to players outside the coach's squads is a 404 naming them, and assigns no one", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const outsider = await signedUpClient(server, "player");
  const other = await coachWithSquad(server, 1);
  const ladderId = await createLadder(coach.client);
  const res = await coach.client.post(`/api/ladders/${ladderId}/assignments`, {
    playerIds: [members[0]!.id, outsider.id, other.members[0]!.id],
  });
  expect(res.status).toBe(404);
  expect(res.body.error.message).toContain(outsider.id);
  expect(res.body.error.message).toContain(other.members[0]!.id);
  expect(res.body.error.fields).toEqual({ "playerIds.1": expect.any(String), "playerIds.2": expect.any(String) });
  expect((await members[0]!.client.get("/api/assignments")).body.assignments).toEqual([]);
  // Another coach's squad is not found either.
  expect((await coach.client.post(`/api/ladders/${ladderId}/assignments`, { squadId: other.squadId })).status).toBe(404);
  // Listed players of one's own squads are fine, and land in that squad.
  const ok = await coach.client.post(`/api/ladders/${ladderId}/assignments`, { playerIds: [members[0]!.id, members[0]!.id] });
  expect(ok.status).toBe(201);
  expect(ok.body.assignments).toHaveLength(1);
  expect(ok.body.assignments[0].squadId).toBe(squadId);
});

test("POST /api/ladders/:id/assignments with bad input is a 400 naming the fields", async () => {
  const coach = await signedUpClient(server, "coach");
  const ladderId = await createLadder(coach.client);
  const emptySquad = await createSquad(coach.client, "Nobody yet");
  const cases: Array<[unknown, string]> = [
    [{}, "playerIds"],
    [{ playerIds: [] }, "playerIds"],
    [{ playerIds: ["x"], squadId: emptySquad }, "playerIds"],
    [{ playerIds: ["not an id!"] }, "playerIds.0"],
    [{ squadId: "nope" }, "squadId"],
    [{ squadId: emptySquad, dueDate: "2026-13-40" }, "dueDate"],
    [{ squadId: emptySquad }, "squadId"],
    [{ squadId: emptySquad, extra: 1 }, "body"],
  ];
  for (const [input, field] of cases) {
    const res = await coach.client.post(`/api/ladders/${ladderId}/assignments`, input);
    expect(res.status, JSON.stringify(input)).toBe(400);
    expect(Object.keys(res.body.error.fields), JSON.stringify(input)).toContain(field);
  }
});

test("POST /api/assignments/:id/putts with bad input is a 400 naming the fields and stores nothing", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const [id] = await assign(coach.client, await createLadder(coach.client), { squadId });
  const cases: Array<[unknown, string]> = [
    [{}, "holed"],
    [{ holed: "yes" }, "holed"],
    [{ holed: true, missSide: "left" }, "missSide"],
    [{ holed: false, missSide: "long" }, "missSide"],
    [{ holed: false, missLengthM: 100 }, "missLengthM"],
    [{ holed: false, clientId: "abc" }, "clientId"],
    [{ holed: false, distanceM: 4 }, "body"],
  ];
  for (const [input, field] of cases) {
    const res = await player.client.post(`/api/assignments/${id}/putts`, input);
    expect(res.status, JSON.stringify(input)).toBe(400);
    expect(Object.keys(res.body.error.fields), JSON.stringify(input)).toContain(field);
  }
  expect((await player.client.post("/api/assignments/not-a-uuid/putts", { holed: true })).status).toBe(400);
  const stored = await server.database.db.select().from(putts).where(isNotNull(putts.assignmentId));
  expect(stored.filter((p) => p.assignmentId === id)).toEqual([]);
});

test("an assignment keeps the ladder as it was: editing or deleting the ladder later changes nothing", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const ladderId = await createLadder(coach.client);
  const [id] = await assign(coach.client, ladderId, { squadId });
  await coach.client.put(`/api/ladders/${ladderId}`, { ...THREE_RUNGS, name: "Changed", rungs: [THREE_RUNGS.rungs[2]] });
  let view = await player.client.get(`/api/assignments/${id}`);
  expect(view.body.ladder).toMatchObject({ name: "Test ladder", rungs: THREE_RUNGS.rungs });
  expect((await coach.client.delete(`/api/ladders/${ladderId}`)).status).toBe(204);
  expect((await putt(player.client, id!, H)).status).toBe(201);
  view = await player.client.get(`/api/assignments/${id}`);
  expect(view.body.ladder.rungs).toHaveLength(3);
  expect(view.body.progress.puttsTaken).toBe(1);
});

test("a built-in ladder can be assigned as it is; a past due date shows as overdue", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const builtIn = (await coach.client.get("/api/ladders")).body.ladders.find((l: { name: string }) => l.name === "Pace ladder");
  const res = await coach.client.post(`/api/ladders/${builtIn.id}/assignments`, { playerIds: [members[0]!.id], dueDate: "2020-01-01" });
  expect(res.status).toBe(201);
  expect(res.body.assignments[0]).toMatchObject({ ladder: { name: "Pace ladder", sourceLadderId: builtIn.id }, overdue: true, squadId });
  const [row] = await server.database.db.select().from(ladderAssignments).where(eq(ladderAssignments.id, res.body.assignments[0].id));
  expect(row!.ladderId).toBeNull();
  const first = await putt(members[0]!.client, res.body.assignments[0].id, M);
  expect(first.body.putts[0].distanceM).toBeCloseTo(10 * 0.3048, 9); // the Pace ladder starts at 10 ft (issue 14: whole feet)
});

test("seedCoaching assigns the two demo ladders to the squad with progress the coach's view replays", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 4);
  const db = server.database.db;
  await db.insert(ladders).values(DEMO_LADDERS.map((l) => ({ ownerId: coach.id, ...l })));
  await seedCoaching(db, { coachId: coach.id, squadId, playerIds: members.map((m) => m.id) });

  const players = (await coach.client.get("/api/coach/players")).body.players as Array<{
    id: string;
    assignments: Array<Record<string, unknown>>;
  }>;
  const byPlayer = (i: number) => {
    const row = players.find((p) => p.id === members[i]!.id)!;
    return Object.fromEntries(row.assignments.map((a) => [a.ladderName, a]));
  };
  expect(byPlayer(0)["Three-to-nine"]).toMatchObject({ status: "completed", rungReached: 7, rungsTotal: 7, puttsTaken: 30 });
  expect(byPlayer(0)["Lag ladder"]).toMatchObject({ status: "in-progress", rungReached: 3, puttsTaken: 5 });
  expect(byPlayer(1)["Three-to-nine"]).toMatchObject({ status: "in-progress", rungReached: 3, currentRung: 2 });
  expect(byPlayer(3)["Three-to-nine"]).toMatchObject({ status: "assigned", puttsTaken: 0 });
  // The stored status agrees with the replay, and the putts sit in practice sessions of their own.
  const rows = await db.select().from(ladderAssignments).where(eq(ladderAssignments.squadId, squadId));
  expect(rows).toHaveLength(8);
  for (const row of rows) {
    const view = players.flatMap((p) => p.assignments).find((a) => a.id === row.id)!;
    expect(row.status).toBe(view.status);
  }
  const seeded = await db
    .select()
    .from(putts)
    .where(
      inArray(
        putts.assignmentId,
        rows.map((r) => r.id),
      ),
    );
  expect(seeded).toHaveLength(30 + 13 + 8 + 5 + 8);
  expect((await members[0]!.client.get("/api/assignments")).body.assignments).toHaveLength(2);
});

test("putts sent at the same moment are applied one at a time: the ladder takes exactly what it needs", async () => {
  const { coach, squadId, members } = await coachWithSquad(server, 1);
  const player = members[0]!;
  const threeBalls = { ...ONE_BALL, rungs: [{ distanceM: 1, balls: 3, passRule: { kind: "make" as const, made: 3 } }] };
  const [id] = await assign(coach.client, await createLadder(coach.client, threeBalls), { squadId });
  const answers = await Promise.all(Array.from({ length: 6 }, () => putt(player.client, id!, H)));
  expect(answers.map((a) => a.status).sort()).toEqual([201, 201, 201, 409, 409, 409]);
  const view = await player.client.get(`/api/assignments/${id}`);
  expect(view.body.progress).toMatchObject({ completed: true, puttsTaken: 3 });
  expect(view.body.putts).toHaveLength(3);

  // The same clientId sent twice at once is stored once.
  const [again] = await assign(coach.client, await createLadder(coach.client, threeBalls), { squadId });
  const clientId = crypto.randomUUID();
  const both = await Promise.all([putt(player.client, again!, H, { clientId }), putt(player.client, again!, H, { clientId })]);
  expect(both.map((a) => a.status).sort()).toEqual([200, 201]);
  expect((await player.client.get(`/api/assignments/${again}`)).body.progress.puttsTaken).toBe(1);
});
