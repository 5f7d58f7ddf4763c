// The browser works a read and a chart out itself when the server cannot be reached (issue 14): its answer must be
// the server's, to the last digit, including the "cannot stop" 422.
import { afterAll, beforeAll, expect, test } from "vitest";
import { readOffline, chartOffline } from "../../src/features/reads/utils/offline-answers";
import { isApiError } from "../../src/lib/api-client";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
let client: HttpClient;
beforeAll(async () => {
  server = await startTestServer();
  client = new HttpClient(server.url);
});
afterAll(async () => {
  await server?.stop();
});

const reads = [
  { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } },
  { distanceM: 6.1, slopePct: 3.5, fallLineDeg: 225, stimpFt: 11.5, pace: { rollPastM: 0 } },
  { distanceM: 1.2, slopePct: 1, fallLineDeg: 0, stimpFt: 8, pace: { entrySpeedMps: 0.6 } },
];

test.each(reads)("a read offline is the server's POST /api/reads/solve answer ($distanceM m, $slopePct %, $fallLineDeg°)", async (read) => {
  const res = await client.post("/api/reads/solve", read);
  expect(res.status).toBe(200);
  expect(readOffline(read)).toEqual(res.body);
});

test("a ball that cannot stop: offline, the same 422 body (message, field, steepest slope) as the server's", async () => {
  const read = { distanceM: 3, slopePct: 7.5, fallLineDeg: 180, stimpFt: 13, pace: { rollPastM: 0.45 } };
  const res = await client.post("/api/reads/solve", read);
  expect(res.status).toBe(422);
  let thrown: unknown;
  try {
    readOffline(read);
  } catch (error) {
    thrown = error;
  }
  expect(isApiError(thrown) && thrown.status).toBe(422);
  expect(isApiError(thrown) && thrown.body).toEqual(res.body);
});

test("a refused read offline is a 400 naming the field, as the server's", async () => {
  const read = { distanceM: -1, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };
  const res = await client.post("/api/reads/solve", read);
  expect(res.status).toBe(400);
  let thrown: unknown;
  try {
    readOffline(read as never);
  } catch (error) {
    thrown = error;
  }
  expect(isApiError(thrown) && thrown.status).toBe(400);
  expect(isApiError(thrown) && Object.keys(thrown.fields)).toEqual(Object.keys(res.body.error.fields));
});

test("a break chart offline is the server's POST /api/reads/chart answer", async () => {
  const input = { slopePct: 2.5, stimpFt: 10, pace: { rollPastM: 0.3 }, distances: [1, 2, 4, 6], fallLineDegs: [0, 60, 90, 200, 300] };
  const res = await client.post("/api/reads/chart", input);
  expect(res.status).toBe(200);
  expect(chartOffline(input)).toEqual(res.body);
});
