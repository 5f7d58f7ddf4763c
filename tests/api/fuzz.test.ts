// A fast-check fuzz of every JSON API route and of better-auth's own routes: wrong types, missing and extra fields, huge strings, negative
// and non-finite numbers, malformed JSON, wrong content types, oversized bodies. Every answer must be a
// well-formed response below 500 (a 4xx with the JSON error shape when refused), never a hang, and a
// refused request must leave the database exactly as it was.
import { textProblem } from "../../shared/schemas/text";
import { databaseFingerprint } from "../setup/fingerprint";
import fc from "fast-check";
import { afterAll, beforeAll, expect, test } from "vitest";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { fillPath, listApiRoutes, type ApiRoute } from "../setup/routes";
import { startTestServer, type TestServer } from "../setup/server";

const RUNS = Number(process.env.FUZZ_RUNS ?? 10_000);
const TIMEOUT_MS = 5_000;

/** better-auth's routes a generated request may hit (not those that end the fuzzing clients' sessions). */
const AUTH_ROUTES: ApiRoute[] = [
  "POST /api/auth/sign-up/email",
  "POST /api/auth/sign-in/email",
  "POST /api/auth/update-user",
  "POST /api/auth/request-password-reset",
  "POST /api/auth/send-verification-email",
  "POST /api/auth/reset-password",
  "POST /api/auth/verify-password",
  "GET /api/auth/get-session",
  "GET /api/auth/verify-email",
].map((r) => ({ method: r.split(" ")[0]!, path: r.split(" ")[1]! }));

let server: TestServer;
let routes: ApiRoute[];
let player: HttpClient;
let coach: HttpClient;
let anon: HttpClient;
const knownIds: string[] = [];

beforeAll(async () => {
  server = await startTestServer();
  routes = [...listApiRoutes(server.app), ...AUTH_ROUTES];
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
const weirdValue: fc.Arbitrary<unknown> = fc.oneof(
  weirdNumber,
  weirdString,
  fc.boolean(),
  fc.constant(null),
  fc.jsonValue({ maxDepth: 3 }),
);
const likelyKeys = [
  "distanceM",
  "slopePct",
  "fallLineDeg",
  "stimpFt",
  "pace",
  "rollPastM",
  "entrySpeedMps",
  "date",
  "greenId",
  "notes",
  "holed",
  "missSide",
  "missLengthM",
  "breakType",
  "clientId",
  "name",
  "description",
  "email",
  "playerIds",
  "squadId",
  "dueDate",
  "rungs",
  "failRule",
  "units",
  "read",
  "label",
  "level",
  "putt",
  "guess",
  "holes",
  "measuredOn",
  "upFt",
  "downFt",
  "tags",
  "conditions",
  "page",
  "pageSize",
  "sort",
  "from",
  "to",
  "bands",
  "playerId",
  "mapping",
  "__proto__",
  "constructor",
];
const bodyObject = fc.dictionary(fc.constantFrom(...likelyKeys), weirdValue, { maxKeys: 6 });

type Kind = "json" | "malformed" | "wrong-type" | "oversized" | "upload" | "big-upload" | "none";
const requestArb = fc.record({
  routeIndex: fc.nat(),
  who: fc.constantFrom("player", "coach", "anon"),
  kind: fc.constantFrom<Kind>("json", "json", "json", "malformed", "wrong-type", "oversized", "upload", "big-upload", "none"),
  fileText: fc.oneof(
    fc.string({ maxLength: 400 }),
    fc.constantFrom("date,distance,holed\n2026-11-01,3,yes\n", "\u0000\u0001binary", 'a,b\n"unclosed'),
  ),
  body: fc.oneof(bodyObject, weirdValue),
  param: fc.oneof(fc.uuid(), fc.constantFrom("0", "-1", "abc", "%00", "..", "x".repeat(300)), fc.constant("known")),
  knownIndex: fc.nat(),
  query: fc.dictionary(
    fc.constantFrom("from", "to", "bands", "page", "pageSize", "sort", "playerId", "window", "limit", "greenId"),
    weirdString,
    { maxKeys: 3 },
  ),
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
      const url = new URL(
        fillPath(route.path, () => (r.param === "known" ? known : r.param)),
        server.url,
      );
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

// ---- hostile text in otherwise valid bodies, /api/auth/* included ---------------------------------------

/** Strings that once broke a route or could: NUL, lone surrogates, direction overrides, huge, prototype keys, SQL, HTML, formulas. */
const HOSTILE = [
  "\u0000",
  "Green\u0000Side",
  "\ud800",
  "Left\udc00Edge",
  "\u202Etxt.exe",
  "Tee\u2066Box",
  "x".repeat(10_000),
  "__proto__",
  "constructor",
  `'; DROP TABLE "user"; --`,
  "Robert'); DELETE FROM putts;--",
  "<script>alert(1)</script>",
  '<img src=x onerror="alert(1)">',
  '=HYPERLINK("http://evil.example","x")\n=1+1',
  "+1\n-2\r\n@SUM(A1:A9)",
  "\t=cmd|' /C calc'!A0",
  "Bell\u0007Ring",
  "Two\u0085Lines",
];

/** Fields whose value is not answered back (secrets, addresses a mail goes to, tokens). */
const NOT_ECHOED = new Set(["email", "password", "currentPassword", "newPassword", "token", "redirectTo", "callbackURL"]);

type Json = string | number | boolean | null | Json[] | { [k: string]: Json };
type Leaf = { path: (string | number)[]; value: string };

function stringLeaves(value: Json, path: (string | number)[] = []): Leaf[] {
  if (typeof value === "string") return [{ path, value }];
  if (Array.isArray(value)) return value.flatMap((v, i) => stringLeaves(v, [...path, i]));
  if (value && typeof value === "object") return Object.entries(value).flatMap(([k, v]) => stringLeaves(v, [...path, k]));
  return [];
}

function withLeaf(value: Json, path: (string | number)[], replacement: string): Json {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  if (Array.isArray(value)) return value.map((v, i) => (i === head ? withLeaf(v, rest, replacement) : v));
  const obj = value as Record<string, Json>;
  return { ...obj, [head as string]: withLeaf(obj[head as string]!, rest, replacement) };
}

type Case = {
  route: string;
  as: () => HttpClient;
  path: () => string;
  body: () => Json;
  /** Where the stored text is read back, when the answer itself does not carry it. */
  readBack?: (answer: any) => string;
  accepted?: (body: Json) => void;
};

test("every string field of a valid body, for every route with text and /api/auth/*, replaced by each hostile string: never a 5xx, refusals change nothing, accepted text reads back identical", async () => {
  const { THREE_RUNGS, createSquad, joinedPlayer } = await import("../factories/coaching");
  const { TEST_PASSWORD, uniqueEmail } = await import("../factories/users");
  const ok = async (res: Promise<{ status: number; body: any }>) => {
    const r = await res;
    if (r.status >= 300) throw new Error(`fixture: ${r.status} ${JSON.stringify(r.body)}`);
    return r.body;
  };
  const squadId = await createSquad(coach, "Hostile squad");
  const member = await joinedPlayer(server, coach, squadId, "Hostile Member");
  const ladderId = (await ok(coach.post("/api/ladders", { ...THREE_RUNGS, name: "Hostile ladder" }))).id as string;
  const assignmentId = (await ok(coach.post(`/api/ladders/${ladderId}/assignments`, { playerIds: [member.id] }))).assignments[0]
    .id as string;
  const greenId = (await ok(player.post("/api/greens", { name: "Hostile green" }))).id as string;
  const sessionId = (await ok(player.post("/api/sessions", { date: "2026-05-01" }))).id as string;
  // An account of its own for the password change, whose password the accepted requests change.
  const changer = new HttpClient(server.url);
  const changerEmail = uniqueEmail("changer");
  let changerPassword = TEST_PASSWORD;
  await ok(
    changer.post("/api/auth/sign-up/email", { name: "Changer", email: changerEmail, password: changerPassword, accountType: "player" }),
  );

  const ladder = (name: string): Json => ({
    name,
    description: "Three short rungs\nthen a long one",
    failRule: "drop-one",
    rungs: [{ distanceM: 1, balls: 3, passRule: { kind: "make", made: 2 }, note: "Firm pace" }],
  });
  const cases: Case[] = [
    { route: "POST /api/squads", as: () => coach, path: () => "/api/squads", body: () => ({ name: "Squad", description: "About\nus" }) },
    {
      route: "PATCH /api/squads/:id",
      as: () => coach,
      path: () => `/api/squads/${squadId}`,
      body: () => ({ name: "Squad", description: "About" }),
    },
    {
      route: "POST /api/squads/:id/invitations",
      as: () => coach,
      path: () => `/api/squads/${squadId}/invitations`,
      body: () => ({ email: uniqueEmail("inv") }),
    },
    { route: "POST /api/ladders", as: () => coach, path: () => "/api/ladders", body: () => ladder("Ladder") },
    { route: "PUT /api/ladders/:id", as: () => coach, path: () => `/api/ladders/${ladderId}`, body: () => ladder("Ladder") },
    { route: "POST /api/ladders/:id/copy", as: () => coach, path: () => `/api/ladders/${ladderId}/copy`, body: () => ({ name: "Copy" }) },
    {
      route: "POST /api/ladders/:id/assignments",
      as: () => coach,
      path: () => `/api/ladders/${ladderId}/assignments`,
      body: () => ({ playerIds: [member.id], dueDate: "2026-06-01" }),
    },
    {
      route: "POST /api/assignments/:id/putts",
      as: () => member.client,
      path: () => `/api/assignments/${assignmentId}/putts`,
      body: () => ({ holed: false, missSide: "left" }),
    },
    {
      route: "POST /api/players/:playerId/notes",
      as: () => coach,
      path: () => `/api/players/${member.id}/notes`,
      body: () => ({ body: "Firm pace\nfrom six feet" }),
    },
    {
      route: "POST /api/greens",
      as: () => player,
      path: () => "/api/greens",
      body: () => ({ name: "Green", locationNote: "By the\nclubhouse" }),
    },
    {
      route: "PATCH /api/greens/:id",
      as: () => player,
      path: () => `/api/greens/${greenId}`,
      body: () => ({ name: "Green", locationNote: "Note" }),
    },
    {
      route: "POST /api/greens/:id/stimp-readings",
      as: () => player,
      path: () => `/api/greens/${greenId}/stimp-readings`,
      body: () => ({ measuredOn: "2026-05-01", stimpFt: 10, note: "Morning" }),
    },
    {
      route: "POST /api/sessions",
      as: () => player,
      path: () => "/api/sessions",
      body: () => ({ date: "2026-05-01", conditions: "Dry", tags: ["drill"], notes: "Line\nand pace" }),
      readBack: (a) => `/api/sessions/${a.id}`,
    },
    {
      route: "PATCH /api/sessions/:id",
      as: () => player,
      path: () => `/api/sessions/${sessionId}`,
      body: () => ({ conditions: "Wet", tags: ["tag"], notes: "Notes" }),
    },
    {
      route: "POST /api/sessions/:id/putts",
      as: () => player,
      path: () => `/api/sessions/${sessionId}/putts`,
      body: () => ({ distanceM: 2, holed: false, missSide: "left", breakType: "uphill" }),
    },
    {
      route: "POST /api/rounds",
      as: () => player,
      path: () => "/api/rounds",
      body: () => ({ date: "2026-05-01", course: "Heath", notes: "Windy\nday" }),
    },
    {
      route: "POST /api/reads",
      as: () => player,
      path: () => "/api/reads",
      body: () => ({ read: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10, pace: { rollPastM: 0.45 } }, label: "Left edge" }),
    },
    { route: "PATCH /api/me/preferences", as: () => player, path: () => "/api/me/preferences", body: () => ({ units: "metric" }) },
    {
      route: "POST /api/training/attempts",
      as: () => player,
      path: () => "/api/training/attempts",
      body: () => ({
        level: "club",
        putt: { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
        guess: { aimOffsetM: -0.1, flatPuttLengthM: 3.4 },
      }),
    },
    // better-auth's routes, behind the same guard.
    {
      route: "POST /api/auth/sign-up/email",
      as: () => new HttpClient(server.url),
      path: () => "/api/auth/sign-up/email",
      body: () => ({ name: "New Golfer", email: uniqueEmail("hostile"), password: TEST_PASSWORD, accountType: "player" }),
    },
    {
      route: "POST /api/auth/update-user",
      as: () => player,
      path: () => "/api/auth/update-user",
      body: () => ({ name: "Renamed Golfer" }),
      readBack: () => "/api/me",
    },
    {
      route: "POST /api/auth/sign-in/email",
      as: () => new HttpClient(server.url),
      path: () => "/api/auth/sign-in/email",
      body: () => ({ email: changerEmail, password: "not-the-password" }),
    },
    {
      route: "POST /api/auth/request-password-reset",
      as: () => new HttpClient(server.url),
      path: () => "/api/auth/request-password-reset",
      body: () => ({ email: uniqueEmail("nobody"), redirectTo: "/reset-password" }),
    },
    {
      route: "POST /api/auth/send-verification-email",
      as: () => new HttpClient(server.url),
      path: () => "/api/auth/send-verification-email",
      body: () => ({ email: uniqueEmail("nobody"), callbackURL: "/" }),
    },
    {
      route: "POST /api/auth/reset-password",
      as: () => new HttpClient(server.url),
      path: () => "/api/auth/reset-password",
      body: () => ({ token: "not-a-token", newPassword: "a-new-password" }),
    },
    {
      route: "POST /api/auth/change-password",
      as: () => changer,
      path: () => "/api/auth/change-password",
      body: () => ({ currentPassword: changerPassword, newPassword: "a-new-password" }),
      accepted: (body) => {
        changerPassword = (body as { newPassword: string }).newPassword;
      },
    },
  ];

  let tried = 0;
  let fiveHundreds = 0;
  let accepted = 0;
  let before = await fingerprint();
  for (const c of cases) {
    const leaves = stringLeaves(c.body());
    expect(leaves.length, `${c.route} has text`).toBeGreaterThan(0);
    for (const leaf of leaves) {
      for (const hostile of HOSTILE) {
        const body = withLeaf(c.body(), leaf.path, hostile);
        const res = await c.as().request(c.route.split(" ")[0]!, c.path(), body);
        tried += 1;
        const field = leaf.path.join(".");
        const where = `${c.route} ${field}=${JSON.stringify(hostile.slice(0, 40))} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`;
        if (res.status >= 500) fiveHundreds += 1;
        expect(res.status, where).toBeLessThan(500);
        if (res.status >= 400) {
          expect(res.body, where).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
          expect(await fingerprint(), `database changed by a refusal: ${where}`).toBe(before);
        } else {
          accepted += 1;
          c.accepted?.(body);
          const key = String(leaf.path.at(-1));
          if (!NOT_ECHOED.has(key)) {
            // Byte for byte: the JSON-escaped text appears in what is read back as it was sent.
            const stored = c.readBack ? (await c.as().get(c.readBack(res.body))).body : res.body;
            expect(JSON.stringify(stored), `read back: ${where}`).toContain(JSON.stringify(hostile).slice(1, -1));
          }
          before = await fingerprint();
        }
        // Text with a NUL, a lone surrogate, a control character other than a new line or a direction override is never stored.
        if (textProblem(hostile, true)) expect(res.status, `refused: ${where}`).toBe(400);
      }
    }
  }
  console.info(`hostile text: ${tried} requests over ${cases.length} routes, ${accepted} accepted, ${fiveHundreds} × 5xx`);
  expect(fiveHundreds).toBe(0);
}, 600_000);
