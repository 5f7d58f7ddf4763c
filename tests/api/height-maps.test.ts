import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import { greens, squadMembers, squads } from "../../server/db/schema";
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

const fixture = (name: string) => fs.readFileSync(path.join(import.meta.dirname, "../fixtures/height-maps", name), "utf8");

async function greenOf(ownerId: string, name = "Top green"): Promise<string> {
  const [row] = await server.database.db.insert(greens).values({ ownerId, name }).returning({ id: greens.id });
  return row!.id;
}

function csvForm(csv: string, fields: Record<string, string>, filename = "map.csv", type = "text/csv"): FormData {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  form.append("file", new Blob([csv], { type }), filename);
  return form;
}

const put = (client: HttpClient, id: string, payload: unknown) => client.request("PUT", `/api/greens/${id}/height-map`, payload);

/** A plane h = gx·x + gy·y as CSV rows north to south (the stated format). */
function planeCsv(gx: number, gy: number, n: number, h: number): string {
  const rows: string[] = [];
  for (let r = 0; r < n; r++) {
    const y = (n - 1 - r) * h;
    rows.push(Array.from({ length: n }, (_, i) => (gx * i * h + gy * y).toFixed(6)).join(","));
  }
  return rows.join("\n") + "\n";
}

test("PUT /api/greens/:id/height-map takes a CSV grid and answers its summary; GET returns it; DELETE removes it", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  const res = await put(a.client, id, csvForm(fixture("tilted-saddle.csv"), { spacingM: "0.5" }));
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({
    nx: 25,
    ny: 25,
    spacingM: 0.5,
    originM: [0, 0],
    widthM: 12,
    depthM: 12,
    source: "grid",
    spotCount: null,
  });
  // The saddle's steepest node-to-node grade: about 6 % on the east edge (derived from its formula).
  expect(res.body.maxSlopePct).toBeGreaterThan(4);
  expect(res.body.maxSlopePct).toBeLessThan(7);
  expect(res.body.minHeightM).toBeLessThan(res.body.maxHeightM);
  const got = await a.client.get(`/api/greens/${id}/height-map`);
  expect(got.status).toBe(200);
  expect(got.body.heightsM).toHaveLength(25);
  expect(got.body.heightsM[0]).toHaveLength(25);
  // From the fixture's formula: (x 0, y 6) on the west edge = 0.108 m; (x 6, y 0) on the south edge = −0.018 m.
  expect(got.body.heightsM[12][0]).toBe(0.108);
  expect(got.body.heightsM[24][12]).toBe(-0.018);
  expect((await a.client.delete(`/api/greens/${id}/height-map`)).status).toBe(204);
  expect((await a.client.get(`/api/greens/${id}/height-map`)).status).toBe(404);
  expect((await a.client.delete(`/api/greens/${id}/height-map`)).status).toBe(404);
});

test("PUT /api/greens/:id/height-map takes spot heights (CSV or JSON) and interpolates them onto a grid", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  const csv = await put(a.client, id, csvForm(fixture("tilted-saddle-spots.csv"), { spacingM: "0.5", format: "spots" }));
  expect(csv.status).toBe(200);
  expect(csv.body).toMatchObject({ nx: 25, ny: 25, source: "spots", spotCount: 13 });
  const json = await put(a.client, id, {
    kind: "spots",
    spacingM: 1,
    points: [
      [0, 0, 0],
      [4, 0, 0.04],
      [0, 4, 0],
      [4, 4, 0.04],
      [2, 2, 0.02],
    ],
  });
  expect(json.status).toBe(200);
  expect(json.body).toMatchObject({ nx: 5, ny: 5, source: "spots", spotCount: 5 });
  // A plane through the spot heights stays that plane (linear interpolation on the triangles): 1 % east.
  expect(json.body.maxSlopePct).toBeCloseTo(1, 9);
});

test.each([
  ["a ragged row", "0,0,0\n0,0\n0,0,0\n", { "row 2": "has 2 values; row 1 has 3 (every row needs the same number)" }],
  ["a hole in the grid", "0,0,0\n0,,0\n0,0,0\n", { "row 2, column 2": "is empty (a hole in the grid)" }],
  ["a NaN", "0,0,0\n0,NaN,0\n0,0,0\n", { "row 2, column 2": '"NaN" is not a height in metres' }],
  ["too few rows", "0,0,0\n", { heightsM: "at least 2×2 heights (got 3×1)" }],
  [
    "an absurd slope",
    "0,0,0\n0,0.2,0\n0,0,0\n",
    { "row 1, column 2": "grade 20.0 % to row 2 is over 15 %: check the heights and the spacing" },
  ],
])("PUT /api/greens/:id/height-map refuses %s with the exact error", async (_what, csv, fields) => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  const res = await put(a.client, id, csvForm(csv, { spacingM: "1" }));
  expect(res.status).toBe(400);
  expect(res.body.error.fields).toMatchObject(fields);
});

test("PUT /api/greens/:id/height-map refuses a grid over the size cap, a bad spacing, bad spots and a bad JSON body", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  const wide = Array.from({ length: 3 }, () => new Array(401).fill("0").join(",")).join("\n");
  const big = await put(a.client, id, csvForm(wide, { spacingM: "0.1" }));
  expect(big.status).toBe(400);
  expect(big.body.error.fields.heightsM).toMatch(/at most 400 per side and 40000 heights in all \(got 401×3/);
  const spacing = await put(a.client, id, csvForm("0,0\n0,0\n", { spacingM: "0" }));
  expect(spacing.status).toBe(400);
  expect(spacing.body.error.fields).toHaveProperty("spacingM");
  const line = await put(a.client, id, {
    kind: "spots",
    spacingM: 1,
    points: [
      [0, 0, 0],
      [1, 1, 0],
      [2, 2, 0],
      [3, 3, 0],
    ],
  });
  expect(line.status).toBe(400);
  expect(line.body.error.fields.points).toMatch(/one line/);
  const hull = await put(a.client, id, {
    kind: "spots",
    spacingM: 0.5,
    points: [
      [0, 0, 0],
      [4, 0, 0],
      [2, 4, 0],
      [2, 1, 0],
    ],
  });
  expect(hull.status).toBe(400);
  expect(hull.body.error.fields.points).toMatch(/outside the area the spot heights enclose/);
  const ragged = await put(a.client, id, { kind: "grid", spacingM: 1, heightsM: [[0, 0], [0]] });
  expect(ragged.status).toBe(400);
  expect(ragged.body.error.fields).toMatchObject({ "row 2": expect.stringMatching(/has 1 values/) });
  const kind = await put(a.client, id, { kind: "mesh", spacingM: 1 });
  expect(kind.status).toBe(400);
  expect(kind.body.error.fields).toHaveProperty("kind");
  const notCsv = await put(a.client, id, csvForm("\u0000\u0001", { spacingM: "1" }, "map.png", "image/png"));
  expect(notCsv.status).toBe(415);
});

test("the height map belongs to the green's owner: another user gets 404 on every route; a bad id is a 400", async () => {
  const owner = await signedUpClient(server);
  const other = await signedUpClient(server);
  const id = await greenOf(owner.id);
  expect((await put(owner.client, id, csvForm(planeCsv(0.01, 0, 5, 1), { spacingM: "1" }))).status).toBe(200);
  expect((await put(other.client, id, csvForm(planeCsv(0.01, 0, 5, 1), { spacingM: "1" }))).status).toBe(404);
  expect(
    (
      await put(other.client, id, {
        kind: "grid",
        spacingM: 1,
        heightsM: [
          [0, 0],
          [0, 0],
        ],
      })
    ).status,
  ).toBe(404);
  expect((await other.client.get(`/api/greens/${id}/height-map`)).status).toBe(404);
  expect((await other.client.delete(`/api/greens/${id}/height-map`)).status).toBe(404);
  expect((await other.client.post(`/api/greens/${id}/reads/solve`, { ball: [1, 1], hole: [1, 3], stimpFt: 10 })).status).toBe(404);
  expect((await owner.client.get("/api/greens/not-a-uuid/height-map")).status).toBe(400);
  expect(
    (
      await put(owner.client, "not-a-uuid", {
        kind: "grid",
        spacingM: 1,
        heightsM: [
          [0, 0],
          [0, 0],
        ],
      })
    ).status,
  ).toBe(400);
  // A player in the owner's squad reads the map and solves on it once the green is shared with that squad (not
  // before: a coach's own greens stay theirs), but does not change it.
  const [squad] = await server.database.db.insert(squads).values({ coachId: owner.id, name: "Green squad" }).returning({ id: squads.id });
  await server.database.db.insert(squadMembers).values({ squadId: squad!.id, playerId: other.id });
  expect((await other.client.get(`/api/greens/${id}/height-map`)).status).toBe(404);
  await server.database.db.update(greens).set({ squadId: squad!.id }).where(eq(greens.id, id));
  expect((await other.client.get(`/api/greens/${id}/height-map`)).status).toBe(200);
  expect((await other.client.post(`/api/greens/${id}/reads/solve`, { ball: [1, 1], hole: [1, 3], stimpFt: 10 })).status).toBe(200);
  expect((await other.client.delete(`/api/greens/${id}/height-map`)).status).toBe(403);
});

test("POST /api/greens/:id/reads/solve on a planar map equals POST /api/reads/solve to 1 mm", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  // A plane rising 1.5 % to the east and 0.8 % to the north, 10 m square at 0.5 m.
  const [gx, gy] = [0.015, 0.008];
  expect((await put(a.client, id, csvForm(planeCsv(gx, gy, 21, 0.5), { spacingM: "0.5" }))).status).toBe(200);
  const ball: [number, number] = [2, 2];
  const hole: [number, number] = [6, 5];
  const onMap = await a.client.post(`/api/greens/${id}/reads/solve`, { ball, hole, stimpFt: 11, pace: { rollPastM: 0.45 } });
  expect(onMap.status).toBe(200);
  // The same putt for the planar API (derived): D, slope = 100|∇h|, fall line = downhill −∇h measured clockwise
  // from the ball→hole line.
  const D = Math.hypot(hole[0] - ball[0], hole[1] - ball[1]);
  const ey = [(hole[0] - ball[0]) / D, (hole[1] - ball[1]) / D] as const;
  const ex = [ey[1], -ey[0]] as const;
  const fallLineDeg = ((Math.atan2(-(gx * ex[0] + gy * ex[1]), -(gx * ey[0] + gy * ey[1])) * 180) / Math.PI + 360) % 360;
  const planar = await a.client.post("/api/reads/solve", {
    distanceM: D,
    slopePct: 100 * Math.hypot(gx, gy),
    fallLineDeg,
    stimpFt: 11,
    pace: { rollPastM: 0.45 },
  });
  expect(planar.status).toBe(200);
  expect(Math.abs(onMap.body.aimOffsetM - planar.body.aimOffsetM)).toBeLessThan(1e-3);
  expect(Math.abs(onMap.body.launchSpeedMps - planar.body.launchSpeedMps)).toBeLessThan(1e-3);
  expect(Math.abs(onMap.body.rollPastM - planar.body.rollPastM)).toBeLessThan(1e-3);
  expect(Math.abs(onMap.body.entrySpeedMps - planar.body.entrySpeedMps)).toBeLessThan(1e-3);
  expect(onMap.body.breaks).toBe(planar.body.breaks);
  expect(onMap.body.capture.holed).toBe(true);
  // Paths: green frame starts at the ball; the putt-frame path matches the planar one's end to 1 mm.
  expect(onMap.body.path[0]).toEqual(ball);
  const endMap = onMap.body.puttFramePath.at(-1);
  const endPlanar = planar.body.path.at(-1);
  expect(Math.hypot(endMap[0] - endPlanar[0], endMap[1] - endPlanar[1])).toBeLessThan(1e-3);
});

test("POST /api/greens/:id/reads/solve on the saddle, and its 400s and 404s", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  expect((await a.client.post(`/api/greens/${id}/reads/solve`, { ball: [1, 1], hole: [1, 3], stimpFt: 10 })).status).toBe(404);
  expect((await put(a.client, id, csvForm(fixture("tilted-saddle.csv"), { spacingM: "0.5" }))).status).toBe(200);
  const ok = await a.client.post(`/api/greens/${id}/reads/solve`, { ball: [3, 2], hole: [6, 8], stimpFt: 10 });
  expect(ok.status).toBe(200);
  expect(ok.body.capture.holed).toBe(true);
  expect(ok.body.rollPastM).toBeCloseTo(0.45, 3);
  const outside = await a.client.post(`/api/greens/${id}/reads/solve`, { ball: [-1, 2], hole: [6, 13], stimpFt: 10 });
  expect(outside.status).toBe(400);
  expect(outside.body.error.fields).toMatchObject({
    ball: expect.stringMatching(/inside the map/),
    hole: expect.stringMatching(/inside the map/),
  });
  const bad = await a.client.post(`/api/greens/${id}/reads/solve`, { ball: [1], hole: [6, 8], stimpFt: 99 });
  expect(bad.status).toBe(400);
  expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["ball", "stimpFt"]));
});

test("POST /api/greens/:id/reads/solve on a surface too steep to stop answers the planar read's cannot-stop 422 (issue 13)", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  // An 8 % plane: steeper than the ≈ 7.86 % a ball can stop on at Stimp 10 (docs/sources.md, derived).
  expect((await put(a.client, id, csvForm(planeCsv(0.08, 0, 21, 0.5), { spacingM: "0.5" }))).status).toBe(200);
  const onMap = await a.client.post(`/api/greens/${id}/reads/solve`, { ball: [2, 2], hole: [2, 6], stimpFt: 10 });
  const planar = await a.client.post("/api/reads/solve", { distanceM: 4, slopePct: 8, fallLineDeg: 90, stimpFt: 10 });
  expect(planar.status).toBe(422);
  expect(onMap.status).toBe(422);
  expect(onMap.body.error.code).toBe(planar.body.error.code);
  expect(onMap.body.error.message).toMatch(/cannot stop/i);
  expect(onMap.body.error.details).toEqual(planar.body.error.details);
  expect(onMap.body.error.details.maxStoppableSlopePct).toBeCloseTo(7.86, 1);
});

test("PUT /api/greens/:id/height-map with walked: true stores a walked map (source and spot count); a bad walked flag is a 400 that stores nothing", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id);
  const heightsM = [
    [0.02, 0.02, 0.02],
    [0, 0, 0],
    [-0.02, -0.02, -0.02],
  ];
  const bad = await put(a.client, id, { kind: "grid", spacingM: 2, heightsM, walked: "yes" });
  expect(bad.status).toBe(400);
  expect(bad.body.error.fields).toHaveProperty("walked");
  expect((await a.client.get(`/api/greens/${id}/height-map`)).status).toBe(404);
  const res = await put(a.client, id, { kind: "grid", spacingM: 2, heightsM, walked: true });
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ nx: 3, ny: 3, source: "walked", spotCount: 9, widthM: 4, depthM: 4 });
  // 0.02 m over 2 m between rows: 1 % (hand-computed).
  expect(res.body.maxSlopePct).toBeCloseTo(1, 9);
  const plain = await put(a.client, id, { kind: "grid", spacingM: 2, heightsM });
  expect(plain.body).toMatchObject({ source: "grid", spotCount: null });
});

test("the green's answer (one green and the list) says hasHeightMap: false before a map is PUT, true after, false once deleted", async () => {
  const a = await signedUpClient(server);
  const id = await greenOf(a.id, "Practice green");
  const flags = async () => {
    const one = await a.client.get(`/api/greens/${id}`);
    const list = await a.client.get("/api/greens");
    expect(one.status).toBe(200);
    expect(list.status).toBe(200);
    return [one.body.hasHeightMap, list.body.items.find((g: { id: string }) => g.id === id).hasHeightMap];
  };
  expect(await flags()).toEqual([false, false]);
  const heightsM = [
    [0.02, 0.01, 0],
    [0.02, 0.01, 0],
    [0.02, 0.01, 0],
  ];
  expect((await put(a.client, id, { kind: "grid", spacingM: 1, originM: [0, 0], heightsM })).status).toBe(200);
  expect(await flags()).toEqual([true, true]);
  expect((await a.client.delete(`/api/greens/${id}/height-map`)).status).toBe(204);
  expect(await flags()).toEqual([false, false]);
});
