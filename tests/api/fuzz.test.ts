// A fast-check fuzz of every JSON API route: wrong types, missing and extra fields, huge strings, negative
// and non-finite numbers, malformed JSON, wrong content types, oversized bodies. Every answer must be a
// well-formed response below 500 (a 4xx with the JSON error shape when refused), never a hang, and a
// refused request must leave the database exactly as it was.
import { databaseFingerprint } from "../setup/fingerprint";
import fc from "fast-check";
import { afterAll, beforeAll, expect, test } from "vitest";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { fillPath, listApiRoutes, type ApiRoute } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

const RUNS = Number(process.env.FUZZ_RUNS ?? 10_000);
const TIMEOUT_MS = 5_000;

let server: TestServer;
let routes: ApiRoute[];
let player: HttpClient;
let coach: HttpClient;
let anon: HttpClient;
const knownIds: string[] = [];

beforeAll(async () => {
  server = await startTestServer();
  routes = listApiRoutes(server.app);
  player = (await signedUpClient(server, "player")).client;
  coach = (await signedUpClient(server, "coach")).client;
  anon = new HttpClient(server.url);
  // A few real resources so ids in paths sometimes exist and bodies reach deeper validation.
  const session = await player.post("/api/sessions", { date: "2026-11-20" });
  if (session.body?.id) knownIds.push(session.body.id);
  const squad = await coach.post("/api/squads", { name: "Fuzz squad" });
  if (squad.body?.id) knownIds.push(squad.body.id);
  const green = await player.post("/api/greens", { name: "Fuzz green" });
  if (green.body?.id) knownIds.push(green.body.id);
}, 120_000);

afterAll(async () => {
  await server?.stop();
});

const fingerprint = () => databaseFingerprint(server.database.db);

const weirdNumber = fc.oneof(
  fc.constantFrom(-1, 0, -0, 1e308, -1e308, 2 ** 53, 0.1, 1e-320),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
);
const weirdString = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constantFrom("NaN", "Infinity", "-Infinity", "", " ", "null", "=cmd|' /C calc'!A0", "<script>", "' or 1=1 --", "\u0000", "2026-02-30"),
  fc.string({ minLength: 5_000, maxLength: 20_000 }),
);
const weirdValue: fc.Arbitrary<unknown> = fc.oneof(weirdNumber, weirdString, fc.boolean(), fc.constant(null), fc.jsonValue({ maxDepth: 3 }));
const likelyKeys = [
  "distanceM", "slopePct", "fallLineDeg", "stimpFt", "pace", "rollPastM", "entrySpeedMps", "date", "greenId", "notes", "holed",
  "missSide", "missLengthM", "breakType", "clientId", "name", "description", "email", "playerIds", "squadId", "dueDate", "rungs",
  "failRule", "units", "read", "label", "level", "putt", "guess", "holes", "measuredOn", "upFt", "downFt", "tags", "conditions",
  "page", "pageSize", "sort", "from", "to", "bands", "playerId", "mapping", "__proto__", "constructor",
];
const bodyObject = fc.dictionary(fc.constantFrom(...likelyKeys), weirdValue, { maxKeys: 6 });

type Kind = "json" | "malformed" | "wrong-type" | "oversized" | "upload" | "big-upload" | "none";
const requestArb = fc.record({
  routeIndex: fc.nat(),
  who: fc.constantFrom("player", "coach", "anon"),
  kind: fc.constantFrom<Kind>("json", "json", "json", "malformed", "wrong-type", "oversized", "upload", "big-upload", "none"),
  fileText: fc.oneof(fc.string({ maxLength: 400 }), fc.constantFrom("date,distance,holed\n2026-11-01,3,yes\n", "\u0000\u0001binary", "a,b\n\"unclosed")),
  body: fc.oneof(bodyObject, weirdValue),
  param: fc.oneof(fc.uuid(), fc.constantFrom("0", "-1", "abc", "%00", "..", "x".repeat(300)), fc.constant("known")),
  knownIndex: fc.nat(),
  query: fc.dictionary(fc.constantFrom("from", "to", "bands", "page", "pageSize", "sort", "playerId", "window", "limit", "greenId"), weirdString, { maxKeys: 3 }),
});

test(`${RUNS} generated requests across every API route: never a 5xx, always the error shape, refused requests change nothing`, async () => {
  expect(routes.length).toBeGreaterThan(10);
  const seenRoutes = new Set<string>();
  let before = await fingerprint();
  await fc.assert(
    fc.asyncProperty(requestArb, async (r) => {
      const route = routes[r.routeIndex % routes.length]!;
      seenRoutes.add(`${route.method} ${route.path}`);
      const client = r.who === "player" ? player : r.who === "coach" ? coach : anon;
      const known = knownIds.length > 0 ? knownIds[r.knownIndex % knownIds.length]! : "00000000-0000-4000-8000-000000000000";
      const url = new URL(fillPath(route.path, () => (r.param === "known" ? known : r.param)), server.url);
      for (const [k, v] of Object.entries(r.query)) url.searchParams.set(k, v.slice(0, 2000));
      const target = url.pathname + url.search;

      let body: string | FormData | undefined;
      const headers: Record<string, string> = {};
      const hasBody = route.method !== "GET" && (route.method !== "DELETE" || r.kind === "malformed");
      if (hasBody && r.kind !== "none") {
        if (r.kind === "json") body = JSON.stringify(r.body) ?? "null";
        if (r.kind === "malformed") body = '{"distanceM": 3,, ';
        if (r.kind === "oversized") body = JSON.stringify({ notes: "x".repeat(300_000) });
        if (r.kind === "upload" || r.kind === "big-upload") {
          const form = new FormData();
          const text = r.kind === "big-upload" ? "d,h\n" + "3,yes\n".repeat(400_000) : r.fileText;
          form.append("file", new Blob([text], { type: r.kind === "upload" ? "text/csv" : "application/octet-stream" }), "putts.csv");
          form.append("mapping", JSON.stringify(r.body));
          body = form;
        } else if (r.kind === "wrong-type") {
          body = "distanceM=3&holed=true";
          headers["content-type"] = "application/x-www-form-urlencoded";
        } else if (typeof body === "string") {
          headers["content-type"] = "application/json";
        }
      }
      const res = await Promise.race([
        client.request(route.method, target, body, headers),
        new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`hang: ${route.method} ${target}`)), TIMEOUT_MS)),
      ]);
      const where = `${route.method} ${route.path} (${r.kind}, ${r.who}) → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
      expect(res.status, where).toBeLessThan(500);
      if (res.status >= 400) {
        expect(res.body, where).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
        const after = await fingerprint();
        expect(after, `database changed by a refused request: ${where}`).toBe(before);
      } else {
        before = await fingerprint();
      }
    }),
    { numRuns: RUNS, seed: Number(process.env.FUZZ_SEED ?? 20261201) },
  );
  // Every route was reached at least once.
  expect(seenRoutes.size).toBe(new Set(routes.map((r) => `${r.method} ${r.path}`)).size);
}, 600_000);
