import { afterAll, beforeAll, expect, test } from "vitest";
import { evaluateAttempt } from "../../shared/training";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let anon: HttpClient;
beforeAll(async () => {
  server = await startTestServer();
  anon = new HttpClient(server.url);
});
afterAll(async () => {
  await server?.stop();
});

const putt = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
const attempt = { level: "club", putt, guess: { aimOffsetM: -0.15, flatPuttLengthM: 3.5 } };

test("POST /api/training/attempts scores the read on the server and keeps it", async () => {
  const { client } = await signedUpClient(server);
  const res = await client.post("/api/training/attempts", attempt);
  expect(res.status).toBe(201);
  const expected = evaluateAttempt(putt, attempt.guess);
  if (!expected.ok) throw new Error("cannot stop");
  expect(res.body).toMatchObject({ id: expect.any(String), level: "club", putt, guess: attempt.guess, score: expected.score });
  expect(res.body.aimErrorM).toBeCloseTo(expected.aimErrorM, 9);
  expect(res.body.paceErrorM).toBeCloseTo(expected.paceErrorM, 9);
  // Falls to the right: the true line starts left of the hole, at the 0.45 m target pace.
  expect(res.body.truth.aimOffsetM).toBeLessThan(0);
  expect(res.body.truth.rollPastM).toBeCloseTo(0.45, 2);
  expect(res.body.yours).toMatchObject({ holed: expect.any(Boolean), restM: [expect.any(Number), expect.any(Number)] });
});

test("POST /api/training/attempts: the true read scores 100", async () => {
  const { client } = await signedUpClient(server);
  const fresh = { ...putt, distanceM: 4.2 };
  const truth = evaluateAttempt(fresh, attempt.guess);
  if (!truth.ok) throw new Error("cannot stop");
  const { aimOffsetM, flatPuttLengthM } = truth.truth;
  const exact = await client.post("/api/training/attempts", { ...attempt, putt: fresh, guess: { aimOffsetM, flatPuttLengthM } });
  expect(exact.status).toBe(201);
  expect(exact.body.score).toBe(100);
  expect(exact.body.yours.holed).toBe(true);
});

test("POST /api/training/attempts refuses a second scored read of a putt whose line was revealed (409, nothing stored), at any level", async () => {
  const { client } = await signedUpClient(server);
  const first = await client.post("/api/training/attempts", attempt);
  expect(first.status).toBe(201);
  // The answer the reveal showed, sent back as a read of the same putt: it must not score 100.
  const { aimOffsetM, flatPuttLengthM } = first.body.truth;
  const again = await client.post("/api/training/attempts", { ...attempt, guess: { aimOffsetM, flatPuttLengthM } });
  expect(again.status).toBe(409);
  expect(again.body.error).toMatchObject({ code: "conflict", details: { reason: "already-scored", attemptId: first.body.id } });
  // The same numbers under another level (the "By eye" level shares the club's ranges) are the same putt.
  const otherLevel = await client.post("/api/training/attempts", { ...attempt, level: "by-eye", guess: { aimOffsetM, flatPuttLengthM } });
  expect(otherLevel.status).toBe(409);
  // Numbers written differently (3 and 3.0 are one number in JSON) are still the same putt.
  const reordered = await client.post("/api/training/attempts", {
    guess: { aimOffsetM, flatPuttLengthM },
    putt: { stimpFt: 10.0, fallLineDeg: 90, slopePct: 2, distanceM: 3.0 },
    level: "club",
  });
  expect(reordered.status).toBe(409);
  const kept = (await client.get("/api/training/attempts")).body.items;
  expect(kept).toHaveLength(1);
  expect(kept[0].score).toBe(first.body.score);
  // Another player may still be scored on that putt; and two requests at once for one new putt keep one.
  const other = await signedUpClient(server);
  expect((await other.client.post("/api/training/attempts", attempt)).status).toBe(201);
  const twin = { ...attempt, putt: { ...putt, distanceM: 5.5 } };
  const both = await Promise.all([client.post("/api/training/attempts", twin), client.post("/api/training/attempts", twin)]);
  expect(both.map((r) => r.status).sort()).toEqual([201, 409]);
  expect((await client.get("/api/training/attempts")).body.items).toHaveLength(2);
});

test("POST /api/training/attempts refuses a score sent by the client as an unknown field", async () => {
  const { client } = await signedUpClient(server);
  const res = await client.post("/api/training/attempts", { ...attempt, score: 100 });
  expect(res.status).toBe(400);
  expect(JSON.stringify(res.body.error.fields)).toMatch(/score/);
  expect((await client.get("/api/training/attempts")).body.items).toHaveLength(0);
});

test("POST /api/training/attempts answers 401 when signed out", async () => {
  const res = await anon.post("/api/training/attempts", attempt);
  expect(res.status).toBe(401);
});

test.each([
  ["level", { level: "pro" }],
  ["putt.distanceM", { putt: { ...putt, distanceM: 0 } }],
  ["putt.distanceM", { level: "gentle", putt: { ...putt, distanceM: 9 } }],
  ["putt.slopePct", { putt: { ...putt, slopePct: "steep" } }],
  ["putt.fallLineDeg", { putt: { ...putt, fallLineDeg: 400 } }],
  ["putt.extra", { putt: { ...putt, extra: 1 } }],
  ["guess", { guess: { aimOffsetM: 0 } }],
  ["guess", { guess: { aimOffsetM: 9, flatPuttLengthM: 3 } }],
  ["guess", { guess: { aimOffsetM: 0, flatPuttLengthM: 0 } }],
])("POST /api/training/attempts refuses bad %s with a 400 naming the field", async (field, change) => {
  const { client } = await signedUpClient(server);
  const res = await client.post("/api/training/attempts", { ...attempt, ...change });
  expect(res.status).toBe(400);
  const named = Object.keys(res.body.error.fields ?? {});
  const top = field.split(".")[0]!;
  expect(named.some((k) => k === field || k.startsWith(top))).toBe(true);
});

test("GET /api/training/attempts lists mine only, newest first, up to the limit", async () => {
  const a = await signedUpClient(server);
  const b = await signedUpClient(server);
  // Three putts (one scored attempt each), newest last.
  for (const [i, aimOffsetM] of [-0.3, -0.2, -0.1].entries()) {
    const body = { ...attempt, putt: { ...putt, distanceM: 3 + i / 10 }, guess: { aimOffsetM, flatPuttLengthM: 3.4 } };
    expect((await a.client.post("/api/training/attempts", body)).status).toBe(201);
  }
  expect((await b.client.post("/api/training/attempts", attempt)).status).toBe(201);

  const mine = await a.client.get("/api/training/attempts");
  expect(mine.status).toBe(200);
  expect(mine.body.items).toHaveLength(3);
  expect(mine.body.items.map((i: { guess: { aimOffsetM: number } }) => i.guess.aimOffsetM)).toEqual([-0.1, -0.2, -0.3]);
  expect(mine.body.items[2]).toMatchObject({ level: "club", putt, score: expect.any(Number), createdAt: expect.any(String) });

  const theirs = await b.client.get("/api/training/attempts");
  expect(theirs.body.items).toHaveLength(1);

  const limited = await a.client.get("/api/training/attempts?limit=2");
  expect(limited.body.items).toHaveLength(2);
  const bad = await a.client.get("/api/training/attempts?limit=0");
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("limit");
});

test("GET /api/training/attempts answers 401 when signed out", async () => {
  expect((await anon.get("/api/training/attempts")).status).toBe(401);
});
