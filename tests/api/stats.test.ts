import { afterAll, beforeAll, expect, test } from "vitest";
import { inArray } from "drizzle-orm";
import { user } from "../../server/db/schema";
import { DEMO_COACH, DEMO_PASSWORD, DEMO_PLAYERS } from "../../server/db/seed-data";
import { METRES_PER_FOOT } from "../../shared/units";
import { practicePuttValue } from "../../shared/stats/strokes-gained";
import { twoProportionZTest } from "../../shared/stats/two-proportion";
import { wilsonInterval } from "../../shared/stats/wilson";
import { adminClient, signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { addPutts, makeSquad, newSession, puttsAt, type PuttSpec } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

type BandOut = { fromM: number; toM: number | null; attempts: number; made: number; rate: number | null; ci95: [number, number] | null };
const counts = (bands: BandOut[]) => bands.map((b) => [b.attempts, b.made]);

test("GET /api/stats/make-rates counts per band in SQL, lower edge included, last band open-ended, empty bands null", async () => {
  const { client } = await signedUpClient(server);
  const s = await newSession(client, { date: "2024-05-01" });
  await addPutts(client, s, [
    ...puttsAt(0.5, 3, 1), // [0, 0.6): 3/4
    ...puttsAt(0.6, 1, 1), // exactly on the 0.6 edge → [0.6, 1.2)
    ...puttsAt(1.19, 0, 2), // [0.6, 1.2)
    ...puttsAt(9, 1, 0), // on the last edge → [9, ∞)
    ...puttsAt(25, 0, 3), // [9, ∞)
  ]);
  const res = await client.get("/api/stats/make-rates?bands=0.6,1.2,1.8,3,4.5,6,9");
  expect(res.status).toBe(200);
  const bands: BandOut[] = res.body.bands;
  expect(bands.map((b) => [b.fromM, b.toM])).toEqual([
    [0, 0.6],
    [0.6, 1.2],
    [1.2, 1.8],
    [1.8, 3],
    [3, 4.5],
    [4.5, 6],
    [6, 9],
    [9, null],
  ]);
  expect(counts(bands)).toEqual([
    [4, 3],
    [4, 1],
    [0, 0],
    [0, 0],
    [0, 0],
    [0, 0],
    [0, 0],
    [4, 1],
  ]);
  expect(bands[0]).toMatchObject({ rate: 0.75, ci95: wilsonInterval(3, 4) });
  expect(bands[2]).toMatchObject({ rate: null, ci95: null });
  // A leading 0 changes nothing.
  expect(counts((await client.get("/api/stats/make-rates?bands=0,0.6,1.2,1.8,3,4.5,6,9")).body.bands)).toEqual(counts(bands));
});

test("GET /api/stats/make-rates without bands uses the unit preference: 0-3 … 30+ ft, or 0-1 … 10+ m", async () => {
  const { client } = await signedUpClient(server);
  const s = await newSession(client, { date: "2024-05-01" });
  await addPutts(client, s, [...puttsAt(10 * METRES_PER_FOOT, 1, 1), ...puttsAt(2.5, 1, 0)]);
  const imperial = (await client.get("/api/stats/make-rates")).body.bands as BandOut[];
  expect(imperial.map((b) => [Math.round(b.fromM / METRES_PER_FOOT), b.toM === null ? null : Math.round(b.toM / METRES_PER_FOOT)])).toEqual(
    [
      [0, 3],
      [3, 6],
      [6, 10],
      [10, 15],
      [15, 20],
      [20, 30],
      [30, null],
    ],
  );
  // 10 ft exactly belongs to 10-15 ft; 2.5 m (8.2 ft) to 6-10 ft.
  expect(counts(imperial)).toEqual([
    [0, 0],
    [0, 0],
    [1, 1],
    [2, 1],
    [0, 0],
    [0, 0],
    [0, 0],
  ]);
  await client.patch("/api/me/preferences", { units: "metric" });
  const metric = (await client.get("/api/stats/make-rates")).body.bands as BandOut[];
  expect(metric.map((b) => [b.fromM, b.toM])).toEqual([
    [0, 1],
    [1, 2],
    [2, 3],
    [3, 5],
    [5, 7],
    [7, 10],
    [10, null],
  ]);
  expect(counts(metric)).toEqual([
    [0, 0],
    [0, 0],
    [1, 1],
    [2, 1],
    [0, 0],
    [0, 0],
    [0, 0],
  ]);
});

test("GET /api/stats/make-rates filters by session date, both ends inclusive", async () => {
  const { client } = await signedUpClient(server);
  for (const [date, made] of [
    ["2024-05-01", 1],
    ["2024-05-10", 2],
    ["2024-05-20", 3],
  ] as const) {
    await addPutts(client, await newSession(client, { date }), puttsAt(1, made, 0));
  }
  const total = (q: string) => client.get(`/api/stats/make-rates?bands=5${q}`).then((r) => (r.body.bands as BandOut[])[0]!.attempts);
  expect(await total("")).toBe(6);
  expect(await total("&from=2024-05-10")).toBe(5);
  expect(await total("&to=2024-05-10")).toBe(3);
  expect(await total("&from=2024-05-10&to=2024-05-10")).toBe(2);
});

test("stats query strings are validated with the field named", async () => {
  const { client } = await signedUpClient(server);
  const cases: [string, string][] = [
    ["/api/stats/make-rates?bands=1,1", "bands"],
    ["/api/stats/make-rates?bands=2,1", "bands"],
    ["/api/stats/make-rates?bands=a,b", "bands"],
    ["/api/stats/make-rates?bands=1,,2", "bands"],
    ["/api/stats/make-rates?bands=-1,2", "bands"],
    ["/api/stats/make-rates?bands=100", "bands"],
    ["/api/stats/make-rates?bands=", "bands"],
    ["/api/stats/make-rates?from=2024-06-01&to=2024-05-01", "to"],
    ["/api/stats/make-rates?source=dreams", "source"],
    ["/api/stats/trend?window=month", "window"],
    ["/api/stats/trend?window=rolling&windowWeeks=40", "windowWeeks"],
    ["/api/stats/compare?aFrom=2024-05-01&aTo=2024-05-07&bFrom=2024-05-08", "bTo"],
    ["/api/stats/compare?aFrom=2024-05-07&aTo=2024-05-01&bFrom=2024-05-08&bTo=2024-05-09", "aTo"],
    ["/api/stats/sessions?pageSize=0", "pageSize"],
  ];
  for (const [url, field] of cases) {
    const res = await client.get(url);
    expect(res.status, url).toBe(400);
    expect(res.body.error.fields, url).toHaveProperty(field);
  }
});

test("GET /api/stats/trend answers per band per ISO week, and rolling windows sum the weeks before", async () => {
  const { client } = await signedUpClient(server);
  // 2024-05-06 and 2024-05-20 are Mondays; 2024-05-12 is the Sunday of the first week.
  await addPutts(client, await newSession(client, { date: "2024-05-06" }), puttsAt(1, 1, 1));
  await addPutts(client, await newSession(client, { date: "2024-05-12" }), [...puttsAt(1, 1, 0), ...puttsAt(4, 0, 1)]);
  await addPutts(client, await newSession(client, { date: "2024-05-22" }), puttsAt(1, 3, 0));
  const week = await client.get("/api/stats/trend?bands=2");
  expect(week.status).toBe(200);
  expect(week.body.bands).toEqual([
    { fromM: 0, toM: 2 },
    { fromM: 2, toM: null },
  ]);
  expect(week.body.weeks.map((w: { weekStart: string; bands: BandOut[] }) => [w.weekStart, counts(w.bands)])).toEqual([
    [
      "2024-05-06",
      [
        [3, 2],
        [1, 0],
      ],
    ],
    [
      "2024-05-20",
      [
        [3, 3],
        [0, 0],
      ],
    ],
  ]);
  expect(week.body.weeks[1].bands[1]).toMatchObject({ rate: null, ci95: null });
  const rolling = await client.get("/api/stats/trend?bands=2&window=rolling&windowWeeks=3");
  expect(rolling.body.weeks.map((w: { weekStart: string; bands: BandOut[] }) => [w.weekStart, counts(w.bands)])).toEqual([
    [
      "2024-05-06",
      [
        [3, 2],
        [1, 0],
      ],
    ],
    [
      "2024-05-20",
      [
        [6, 5],
        [1, 0],
      ],
    ],
  ]);
  const short = await client.get("/api/stats/trend?bands=2&window=rolling&windowWeeks=2");
  expect(counts(short.body.weeks[1].bands)).toEqual([
    [3, 3],
    [0, 0],
  ]);
});

test("GET /api/stats/compare sets two periods side by side with a two-proportion z-test", async () => {
  const { client } = await signedUpClient(server);
  await addPutts(client, await newSession(client, { date: "2024-04-10" }), [...puttsAt(1, 12, 18), ...puttsAt(5, 1, 9)]);
  await addPutts(client, await newSession(client, { date: "2024-05-10" }), [...puttsAt(1, 24, 6), ...puttsAt(5, 2, 8)]);
  const res = await client.get("/api/stats/compare?aFrom=2024-04-01&aTo=2024-04-30&bFrom=2024-05-01&bTo=2024-05-31&bands=2");
  expect(res.status).toBe(200);
  expect(res.body.overlap).toBe(false);
  const [near, far] = res.body.bands;
  expect(near).toMatchObject({ fromM: 0, toM: 2, a: { attempts: 30, made: 12 }, b: { attempts: 30, made: 24 } });
  const expected = twoProportionZTest(12, 30, 24, 30);
  expect(near.difference).toBeCloseTo(0.4, 12);
  expect(near.z).toBeCloseTo(expected.z!, 12);
  expect(near.pValue).toBeCloseTo(expected.pValue!, 12);
  expect(near.pValue).toBeLessThan(0.01);
  expect(far).toMatchObject({ a: { attempts: 10, made: 1 }, b: { attempts: 10, made: 2 } });
  expect(far.pValue).toBeGreaterThan(0.5);
  expect(res.body.overall).toMatchObject({ a: { attempts: 40, made: 13 }, b: { attempts: 40, made: 26 } });
});

test("GET /api/stats/baseline answers the tour table with its source and the interpolation rule", async () => {
  const { client } = await signedUpClient(server);
  const res = await client.get("/api/stats/baseline");
  expect(res.status).toBe(200);
  expect(res.body.onePuttRate.source).toMatch(/Broadie.*Every Shot Counts.*2014/);
  expect(res.body.onePuttRate.firmness).toBe("secondary");
  expect(res.body.onePuttRate.points).toContainEqual({ distanceFt: 8, distanceM: expect.closeTo(2.4384, 6), value: 0.5 });
  expect(res.body.expectedPutts.firmness).toBe("memory");
  expect(res.body.interpolation).toMatch(/log-distance/);
  expect(res.body.strokesGained).toMatchObject({ longPuttM: 6, threePuttRangeM: 1 });
});

test("GET /api/stats/sessions answers expected putts, strokes gained and the long-lag share per session", async () => {
  const { client } = await signedUpClient(server);
  const list: PuttSpec[] = [
    { distanceM: 8 * METRES_PER_FOOT, holed: true },
    { distanceM: 8 * METRES_PER_FOOT, holed: false, missSide: "left", missLengthM: -3 * METRES_PER_FOOT },
    { distanceM: 7, holed: false, missSide: "right", missLengthM: 1.4 },
    { distanceM: 9, holed: false, missSide: "right", missLengthM: -0.5 },
    { distanceM: 12, holed: false },
  ];
  const id = await newSession(client, { date: "2024-05-01" });
  await addPutts(client, id, list);
  await newSession(client, { date: "2024-04-01" });
  const res = await client.get("/api/stats/sessions");
  expect(res.status).toBe(200);
  expect(res.body.total).toBe(2);
  const [s, empty] = res.body.items;
  const sg = list.reduce(
    (acc, p) => acc + practicePuttValue({ distanceM: p.distanceM, holed: p.holed, missLengthM: p.missLengthM ?? null }).strokesGained,
    0,
  );
  expect(s).toMatchObject({
    sessionId: id,
    date: "2024-05-01",
    putts: 5,
    holed: 1,
    leavesAssumed: 1,
    longPutts: 3,
    longPuttsKnown: 2,
    longLagsOutside1m: 1,
    longLagOutsideShare: 0.5,
  });
  expect(s.strokesGained).toBeCloseTo(sg, 9);
  // Hand check of the first two (Broadie, Putts Gained 2011: E(8 ft) = 1.5; E(3 ft) = 1.04 [memory table]):
  // +0.5 for the holed 8-footer, 1.5 − (1 + 1.04) = −0.54 for the miss leaving 3 ft.
  const firstTwo =
    practicePuttValue({ distanceM: 8 * METRES_PER_FOOT, holed: true, missLengthM: null }).strokesGained +
    practicePuttValue({ distanceM: 8 * METRES_PER_FOOT, holed: false, missLengthM: -3 * METRES_PER_FOOT }).strokesGained;
  expect(firstTwo).toBeCloseTo(0.5 - 0.54, 9);
  expect(empty).toMatchObject({ putts: 0, strokesGained: 0, longLagOutsideShare: null });
});

test("stats with playerId: a coach sees their squad's players only, a player only themself, an admin anyone", async () => {
  const coach = await signedUpClient(server, "coach");
  const member = await signedUpClient(server);
  const outsider = await signedUpClient(server);
  await makeSquad(server, coach.id, [member.id]);
  await addPutts(member.client, await newSession(member.client), puttsAt(1, 2, 1));
  const urls = [
    "/api/stats/make-rates?bands=2",
    "/api/stats/trend?bands=2",
    "/api/stats/sessions",
    "/api/stats/compare?aFrom=2024-01-01&aTo=2024-12-31&bFrom=2024-01-01&bTo=2024-12-31&bands=2",
  ];
  for (const url of urls) {
    const sep = url.includes("?") ? "&" : "?";
    expect((await coach.client.get(`${url}${sep}playerId=${member.id}`)).status, url).toBe(200);
    expect((await coach.client.get(`${url}${sep}playerId=${outsider.id}`)).status, url).toBe(404);
    expect((await outsider.client.get(`${url}${sep}playerId=${member.id}`)).status, url).toBe(403);
  }
  const seen = await coach.client.get(`/api/stats/make-rates?bands=2&playerId=${member.id}`);
  expect(counts(seen.body.bands)).toEqual([
    [3, 2],
    [0, 0],
  ]);
  expect(seen.body.playerId).toBe(member.id);
  // The coach's own stats are their own (none).
  expect(counts((await coach.client.get("/api/stats/make-rates?bands=2")).body.bands)).toEqual([
    [0, 0],
    [0, 0],
  ]);
  const admin = await adminClient(server);
  expect(counts((await admin.client.get(`/api/stats/make-rates?bands=2&playerId=${outsider.id}`)).body.bands)).toEqual([
    [0, 0],
    [0, 0],
  ]);
  expect((await admin.client.get("/api/stats/make-rates?playerId=nobody")).status).toBe(404);
});

test("signed out, every stats route is 401", async () => {
  const anon = new HttpClient(server.url);
  for (const url of ["/api/stats/make-rates", "/api/stats/trend", "/api/stats/compare", "/api/stats/baseline", "/api/stats/sessions"]) {
    expect((await anon.get(url)).status, url).toBe(401);
  }
});

test("on the demo seed the stats tell its story: the juniors' short putts and lags improve over the weeks", async () => {
  const seeded = await startTestServer({ env: { SEED: "1" } });
  try {
    const coach = new HttpClient(seeded.url);
    expect((await coach.post("/api/auth/sign-in/email", { email: DEMO_COACH.email, password: DEMO_PASSWORD })).status).toBe(200);
    const juniors = await seeded.database.db
      .select({ id: user.id })
      .from(user)
      .where(
        inArray(
          user.email,
          DEMO_PLAYERS.map((p) => p.email),
        ),
      );
    expect(juniors).toHaveLength(4);
    const plus = (iso: string, days: number) => new Date(Date.parse(iso) + days * 86_400_000).toISOString().slice(0, 10);
    const squad = { a: [0, 0], b: [0, 0], sgA: 0, sgB: 0, lagA: [0, 0], lagB: [0, 0] };
    // The weekly sessions on the club's practice green set the two periods; every practice putt in them counts
    // (the ladder runs the coaching seed adds are practice too).
    const [topGreen] = (await coach.get("/api/greens")).body.items;
    for (const { id } of juniors) {
      const sessions = (await coach.get(`/api/sessions?playerId=${id}&greenId=${topGreen.id}&sort=date&pageSize=100`)).body.items as {
        date: string;
      }[];
      expect(sessions).toHaveLength(12);
      const first = sessions[0]!.date;
      const last = sessions[sessions.length - 1]!.date;
      const [aFrom, aTo, bFrom, bTo] = [first, plus(first, 13), plus(last, -13), last];
      // 0-6 ft: the putts the seed's skill model moves most.
      const cmp = (
        await coach.get(
          `/api/stats/compare?playerId=${id}&bands=${6 * METRES_PER_FOOT}&aFrom=${aFrom}&aTo=${aTo}&bFrom=${bFrom}&bTo=${bTo}`,
        )
      ).body;
      // Each junior's ~40 short putts a period are too few to show their own gain reliably (the seed rolls them
      // through the physics model, so chance plays its part); the squad's pooled gain below is the story's test.
      const short = cmp.bands[0];
      squad.a[0]! += short.a.made;
      squad.a[1]! += short.a.attempts;
      squad.b[0]! += short.b.made;
      squad.b[1]! += short.b.attempts;
      for (const s of (await coach.get(`/api/stats/sessions?playerId=${id}&pageSize=100`)).body.items) {
        const inB = s.date >= bFrom;
        const inA = s.date <= aTo;
        if (inA) {
          squad.sgA += s.strokesGained;
          squad.lagA[0]! += s.longLagsOutside1m;
          squad.lagA[1]! += s.longPuttsKnown;
        }
        if (inB) {
          squad.sgB += s.strokesGained;
          squad.lagB[0]! += s.longLagsOutside1m;
          squad.lagB[1]! += s.longPuttsKnown;
        }
      }
    }
    // Squad-wide the short-putt gain is beyond chance (pooled two-proportion z-test).
    const gain = twoProportionZTest(squad.a[0]!, squad.a[1]!, squad.b[0]!, squad.b[1]!);
    expect(gain.difference!).toBeGreaterThan(0.08);
    expect(gain.pValue!).toBeLessThan(0.05);
    expect(squad.sgB).toBeGreaterThan(squad.sgA);
    expect(squad.lagB[0]! / squad.lagB[1]!).toBeLessThan(squad.lagA[0]! / squad.lagA[1]!);
  } finally {
    await seeded.stop();
  }
}, 120_000);
