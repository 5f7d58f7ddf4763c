import { afterAll, beforeAll, expect, test } from "vitest";
import { and, count, eq, inArray, isNull, min, sql } from "drizzle-orm";
import { interpolateBaseline, TOUR_ONE_PUTT_RATE } from "../../shared/stats/baseline";
import { AMATEUR_LOWER_BOUNDS, TOUR_CURVE_SOURCE } from "../fixtures/make-rate-references";
import { seedDemo } from "../../server/db/seed";
import { DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import { practiceSessions, putts, squadMembers, user } from "../../server/db/schema";
import { createLogger } from "../../server/lib/logger";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ env: { SEED: "1" } });
});
afterAll(async () => {
  await server?.stop();
});

test("the demo coach and players can sign in with the README's password", async () => {
  for (const who of [DEMO_COACH, DEMO_PLAYERS[0]]) {
    const client = new HttpClient(server.url);
    const res = await client.post("/api/auth/sign-in/email", { email: who.email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const me = await client.get("/api/me");
    expect(me.body.user).toMatchObject({ email: who.email, name: who.name, emailVerified: true });
  }
  const coach = new HttpClient(server.url);
  await coach.post("/api/auth/sign-in/email", { email: DEMO_COACH.email, password: DEMO_PASSWORD });
  expect((await coach.get("/api/me")).body.user.role).toBe("coach");
});

test("seeding again changes nothing (idempotent)", async () => {
  const db = server.database.db;
  const before = { users: (await db.select({ n: count() }).from(user))[0]!.n, putts: (await db.select({ n: count() }).from(putts))[0]!.n };
  expect(before.putts).toBeGreaterThan(500);
  await seedDemo(db, createLogger("silent"));
  const after = { users: (await db.select({ n: count() }).from(user))[0]!.n, putts: (await db.select({ n: count() }).from(putts))[0]!.n };
  expect(after).toEqual(before);
});

test("seeded people signed up (and joined the squad) before their first logged session", async () => {
  const db = server.database.db;
  for (const p of DEMO_PLAYERS) {
    const [u] = await db.select({ id: user.id, createdAt: user.createdAt }).from(user).where(eq(user.email, p.email));
    const [first] = await db
      .select({ day: min(practiceSessions.date) })
      .from(practiceSessions)
      .where(eq(practiceSessions.playerId, u!.id));
    const [member] = await db.select({ joinedAt: squadMembers.joinedAt }).from(squadMembers).where(eq(squadMembers.playerId, u!.id));
    const firstDay = Date.parse(`${first!.day}T00:00:00Z`);
    expect(u!.createdAt.getTime(), `${p.name} signed up before the first session`).toBeLessThan(firstDay);
    expect(member!.joinedAt.getTime(), `${p.name} joined after signing up`).toBeGreaterThan(u!.createdAt.getTime());
    expect(member!.joinedAt.getTime(), `${p.name} joined before the first session`).toBeLessThan(firstDay);
  }
  const [coach] = await db.select({ createdAt: user.createdAt }).from(user).where(eq(user.email, DEMO_COACH.email));
  expect(coach!.createdAt.getTime()).toBeLessThan(Date.now() - 42 * 86_400_000);
});

test("the seeded juniors' make rate falls with distance and lies between an amateur curve and the tour's", async () => {
  const db = server.database.db;
  const ids = (
    await db
      .select({ id: user.id })
      .from(user)
      .where(
        inArray(
          user.email,
          DEMO_PLAYERS.map((p) => p.email),
        ),
      )
  ).map((u) => u.id);
  const rows = await db
    .select({
      ft: sql<number>`round(${putts.distanceM} / 0.3048)::int`,
      n: count(),
      made: sql<number>`(count(*) filter (where ${putts.holed}))::int`,
    })
    .from(putts)
    .where(and(inArray(putts.playerId, ids), isNull(putts.assignmentId)))
    .groupBy(sql`1`)
    .orderBy(sql`1`);
  const pooled = (fromFt: number, toFt: number) => {
    const r = rows.filter((x) => x.ft >= fromFt && x.ft <= toFt);
    const n = r.reduce((s, x) => s + Number(x.n), 0);
    const made = r.reduce((s, x) => s + Number(x.made), 0);
    return { n, made, rate: made / n, ...wilson(made, n) };
  };
  // Monotone: pooled over neighbouring distances, each range's rate is not above the one before it, beyond
  // what sampling allows (the later range's 95 % Wilson interval reaches down to the earlier one's rate).
  const ranges: [number, number][] = [
    [3, 4],
    [5, 6],
    [8, 10],
    [12, 15],
    [20, 30],
  ];
  const curve = ranges.map(([a, b]) => ({ a, b, ...pooled(a, b) }));
  for (const c of curve) expect(c.n, `${c.a}–${c.b} ft has putts`).toBeGreaterThan(30);
  for (let i = 1; i < curve.length; i++) {
    expect(curve[i]!.lo, `${curve[i]!.a}–${curve[i]!.b} ft is no better than ${curve[i - 1]!.a}–${curve[i - 1]!.b} ft`).toBeLessThanOrEqual(
      curve[i - 1]!.rate,
    );
  }
  // Upper bound, the tour (TOUR_CURVE_SOURCE): at each distance the seed's interval reaches down to the tour rate.
  for (const r of rows) {
    const tour = interpolateBaseline(TOUR_ONE_PUTT_RATE, r.ft * 0.3048);
    expect(wilson(Number(r.made), Number(r.n)).lo, `${r.ft} ft: not better than the tour (${TOUR_CURVE_SOURCE})`).toBeLessThanOrEqual(tour);
  }
  // Lower bound, the weakest amateurs reported for each range (their sources are in the fixture).
  for (const b of AMATEUR_LOWER_BOUNDS) {
    const p = pooled(b.fromFt, b.toFt);
    expect(p.hi, `${b.fromFt}–${b.toFt} ft: ${(p.rate * 100).toFixed(0)} % is not worse than ${b.source}`).toBeGreaterThanOrEqual(b.rate);
  }
});

/** Wilson score interval, 95 % (E. B. Wilson, JASA 22, 1927), written out here as the test's own check. */
function wilson(made: number, n: number): { lo: number; hi: number } {
  const z = 1.959964;
  const p = made / n;
  const centre = (p + (z * z) / (2 * n)) / (1 + (z * z) / n);
  const half = (z / (1 + (z * z) / n)) * Math.sqrt((p * (1 - p)) / n + (z * z) / (4 * n * n));
  return { lo: centre - half, hi: centre + half };
}

test("the demo's Top green is the squad's: a junior sees it (shared by the coach), reads on it and cannot change it", async () => {
  const junior = new HttpClient(server.url);
  expect((await junior.post("/api/auth/sign-in/email", { email: DEMO_PLAYERS[0].email, password: DEMO_PASSWORD })).status).toBe(200);
  const list = await junior.get("/api/greens");
  const top = (list.body.items as { id: string; name: string; mine: boolean; ownerName: string; squad: { name: string } | null }[]).find(
    (g) => g.name === "Top green",
  );
  expect(top).toMatchObject({ mine: false, ownerName: DEMO_COACH.name, squad: { name: expect.any(String) } });
  const green = await junior.get(`/api/greens/${top!.id}`);
  expect(green.body.readings.length).toBeGreaterThan(0);
  expect((await junior.post("/api/sessions", { date: new Date().toISOString().slice(0, 10), greenId: top!.id })).status).toBe(201);
  expect((await junior.patch(`/api/greens/${top!.id}`, { name: "Mine" })).status).toBe(403);
});
