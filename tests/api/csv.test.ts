import { afterAll, beforeAll, expect, test } from "vitest";
import Papa from "papaparse";
import { eq } from "drizzle-orm";
import { greens } from "../../server/db/schema";
import { METRES_PER_FOOT, METRES_PER_INCH } from "../../shared/units";
import { signedUpClient } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";
import { addPutts, makeSquad, newSession } from "./practice-helpers";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => {
  await server?.stop();
});

function form(
  content: string | Uint8Array,
  fields: Record<string, string> = {},
  name = "putts.csv",
  type = "text/csv",
  field = "file",
): FormData {
  const f = new FormData();
  f.append(field, new Blob([content as BlobPart], { type }), name);
  for (const [k, v] of Object.entries(fields)) f.append(k, v);
  return f;
}

const MAPPING = {
  date: "Date",
  distance: "Distance (ft)",
  distanceUnit: "ft",
  holed: "Made",
  missSide: "Side",
  missLength: "Leave (in)",
  missLengthUnit: "in",
  breakType: "Break",
  green: "Green",
};
const GOOD = [
  "Date,Distance (ft),Made,Side,Leave (in),Break,Green",
  "2024-05-01,10,no,left,-6,uphill,Top green",
  "2024-05-01,3,yes,,,straight,Top green",
  "2024-05-01,20,n,R,18,left to right,Top green",
  "2024-05-02,6,1,,,,Lower green",
].join("\n");

async function stored(client: HttpClient) {
  const [p, s, g] = await Promise.all([
    client.get("/api/putts?pageSize=200&sort=createdAt"),
    client.get("/api/sessions"),
    client.get("/api/greens"),
  ]);
  return {
    putts: p.body.items,
    puttCount: p.body.total as number,
    sessionCount: s.body.total as number,
    greenCount: g.body.items.length as number,
  };
}

test("POST /api/csv/putts/preview answers the header, the first rows and a suggested mapping", async () => {
  const { client } = await signedUpClient(server);
  const res = await client.post("/api/csv/putts/preview", form(GOOD));
  expect(res.status).toBe(200);
  expect(res.body.headers).toEqual(["Date", "Distance (ft)", "Made", "Side", "Leave (in)", "Break", "Green"]);
  expect(res.body.rowCount).toBe(4);
  expect(res.body.rows[0]).toEqual(["2024-05-01", "10", "no", "left", "-6", "uphill", "Top green"]);
  expect(res.body.suggestedMapping).toEqual(MAPPING);
  // A semicolon file (a spreadsheet in a decimal-comma locale) with metric headers.
  const semi = await client.post("/api/csv/putts/preview", form("day;distance m;holed\n2024-05-01;1.5;true\n"));
  expect(semi.body).toMatchObject({
    delimiter: ";",
    headers: ["day", "distance m", "holed"],
    suggestedMapping: { date: "day", distance: "distance m", distanceUnit: "m", holed: "holed" },
  });
  const many = await client.post(
    "/api/csv/putts/preview",
    form(["date,distance,holed", ...Array.from({ length: 30 }, () => "2024-05-01,1,true")].join("\n")),
  );
  expect(many.body.rows).toHaveLength(10);
  expect(many.body.rowCount).toBe(30);
});

test("uploads: over 1 MB is 413, not CSV is 415, no file or the wrong field is 400 — all JSON", async () => {
  const { client } = await signedUpClient(server);
  const big = await client.post("/api/csv/putts/preview", form("date,distance,holed\n" + "2024-05-01,1,true\n".repeat(70_000)));
  expect(big.status).toBe(413);
  expect(big.body.error.code).toBe("payload_too_large");
  const png = await client.post(
    "/api/csv/putts/preview",
    form(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]), {}, "photo.png", "image/png"),
  );
  expect(png.status).toBe(415);
  expect(png.body.error.code).toBe("unsupported_media_type");
  const binary = await client.post(
    "/api/csv/putts/preview",
    form(new Uint8Array([0x64, 0x61, 0, 0, 0x74, 0x65]), {}, "renamed.csv", "text/csv"),
  );
  expect(binary.status).toBe(415);
  const latin1 = await client.post(
    "/api/csv/putts/preview",
    form(new Uint8Array([0x67, 0x72, 0xfc, 0x6e, 0x0a]), {}, "green.csv", "text/csv"),
  );
  expect(latin1.status).toBe(415);
  const json = await client.post("/api/csv/putts/preview", { file: "date,distance" });
  expect(json.status).toBe(415);
  const none = new FormData();
  none.append("mapping", "{}");
  const missing = await client.post("/api/csv/putts/preview", none);
  expect(missing.status).toBe(400);
  expect(missing.body.error.fields).toHaveProperty("file");
  const wrongField = await client.post("/api/csv/putts/preview", form(GOOD, {}, "putts.csv", "text/csv", "upload"));
  expect(wrongField.status).toBe(400);
  expect(wrongField.body.error.fields).toHaveProperty("upload");
  const headerOnly = await client.post(
    "/api/csv/putts/import",
    form("Date,Distance (ft),Made\n", {
      mapping: JSON.stringify({ date: "Date", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made" }),
    }),
  );
  expect(headerOnly.status).toBe(400);
  expect(headerOnly.body.error.fields).toHaveProperty("file");
});

test("POST /api/csv/putts/import stores the putts in metres, grouped into sessions by date and green", async () => {
  const { client } = await signedUpClient(server);
  const existing = (await client.post("/api/greens", { name: "top GREEN" })).body.id;
  const res = await client.post("/api/csv/putts/import", form(GOOD, { mapping: JSON.stringify(MAPPING) }));
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ imported: 4, sessionsCreated: 2, greensCreated: 1, skipped: 0, errors: [] });
  const s = await stored(client);
  expect(s).toMatchObject({ puttCount: 4, sessionCount: 2, greenCount: 2 });
  expect(s.putts[0]).toMatchObject({
    date: "2024-05-01",
    distanceM: expect.closeTo(10 * METRES_PER_FOOT, 12),
    holed: false,
    missSide: "left",
    missLengthM: expect.closeTo(-6 * METRES_PER_INCH, 12),
    breakType: "uphill",
  });
  expect(s.putts[2]).toMatchObject({
    missSide: "right",
    missLengthM: expect.closeTo(18 * METRES_PER_INCH, 12),
    breakType: "left-to-right",
  });
  const sessions = (await client.get("/api/sessions?sort=date")).body.items;
  // "Top green" matched the existing "top GREEN" (case-insensitive); "Lower green" was created.
  expect(sessions[0]).toMatchObject({ date: "2024-05-01", greenId: existing, putts: 3, tags: ["csv-import"] });
  expect(sessions[1]).toMatchObject({ date: "2024-05-02", greenName: "Lower green", putts: 1 });
});

test("POST /api/csv/putts/import is all-or-nothing: any bad row → 422 listing every bad row, nothing stored", async () => {
  const { client } = await signedUpClient(server);
  const csv = [
    "Date,Distance (ft),Made,Side,Leave (in),Break,Green",
    "2024-05-01,10,no,left,-6,uphill,Top green", // row 1 fine
    "05/01/2024,10,no,left,-6,uphill,Top green", // row 2: date
    "2024-05-01,ten,maybe,,,,Top green", // row 3: distance and holed
    "",
    "2024-05-01,4,yes,left,,,Top green", // row 5: a holed putt with a miss side
    "2024-05-01,400,no,,,,Top green", // row 6: 122 m is no putt
    "2024-05-01,8,no,middle,3,sidehill,Top green", // row 7: side and break
    `2024-05-01,8,no,left,3,,${"g".repeat(81)}`, // row 8: a green name over 80 characters
  ].join("\n");
  const res = await client.post("/api/csv/putts/import", form(csv, { mapping: JSON.stringify(MAPPING) }));
  expect(res.status).toBe(422);
  expect(res.body.error.code).toBe("unprocessable");
  expect(res.body).toMatchObject({ imported: 0, sessionsCreated: 0, skipped: 6 });
  expect(res.body.errors.map((e: { row: number; line: number; field: string }) => [e.row, e.line, e.field])).toEqual([
    [2, 3, "date"],
    [3, 4, "distance"],
    [3, 4, "holed"],
    [5, 6, "missSide"],
    [6, 7, "distance"],
    [7, 8, "missSide"],
    [7, 8, "breakType"],
    [8, 9, "green"],
  ]);
  for (const e of res.body.errors) expect(e.message.length).toBeGreaterThan(3);
  expect(await stored(client)).toMatchObject({ puttCount: 0, sessionCount: 0, greenCount: 0 });

  const partial = await client.post("/api/csv/putts/import", form(csv, { mapping: JSON.stringify(MAPPING), skipInvalid: "true" }));
  expect(partial.status).toBe(200);
  expect(partial.body).toMatchObject({ imported: 1, sessionsCreated: 1, greensCreated: 1, skipped: 6 });
  expect(partial.body.errors).toHaveLength(8);
  expect(await stored(client)).toMatchObject({ puttCount: 1, sessionCount: 1 });
});

test("POST /api/csv/putts/import refuses a bad mapping with the field named", async () => {
  const { client } = await signedUpClient(server);
  const cases: [Record<string, string>, string][] = [
    [{ mapping: "{not json" }, "mapping"],
    [{ mapping: JSON.stringify({ ...MAPPING, date: "When" }) }, "mapping.date"],
    [{ mapping: JSON.stringify({ ...MAPPING, distanceUnit: "yards" }) }, "mapping.distanceUnit"],
    [{ mapping: JSON.stringify({ date: "Date", distance: "Distance (ft)", distanceUnit: "ft" }) }, "mapping.holed"],
    [{ mapping: JSON.stringify(MAPPING), skipInvalid: "sometimes" }, "skipInvalid"],
    [{}, "mapping"],
  ];
  for (const [fields, field] of cases) {
    const res = await client.post("/api/csv/putts/import", form(GOOD, fields));
    expect(res.status, JSON.stringify(fields)).toBe(400);
    expect(res.body.error.fields, JSON.stringify(fields)).toHaveProperty(field);
  }
  expect((await stored(client)).puttCount).toBe(0);
});

test("GET /api/csv/putts/export is a CSV attachment: formula-looking text is neutralised, negative numbers stay numbers, and it round-trips", async () => {
  const { client } = await signedUpClient(server);
  const green = (await client.post("/api/greens", { name: '=HYPERLINK("http://evil.example","x")' })).body.id;
  const s = await newSession(client, { date: "2024-05-01", greenId: green });
  await addPutts(client, s, [
    { distanceM: 3.2, holed: false, missSide: "left", missLengthM: -0.3, breakType: "downhill" },
    { distanceM: 1.1, holed: true },
    { distanceM: 7.5, holed: false, missSide: "right", missLengthM: 1.25 },
  ]);
  const res = await client.get("/api/csv/putts/export");
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
  expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="?borrowline-putts-\d{4}-\d{2}-\d{2}\.csv"?$/);
  const lines = (res.body as string).split("\r\n");
  expect(lines[0]).toBe("date,green,distance_m,holed,miss_side,miss_length_m,break_type,session_id,putt_id");
  // OWASP "CSV Injection": the text cell starts with ' so a spreadsheet shows it as text; the number does not.
  expect(lines[1]).toMatch(/^2024-05-01,"'=HYPERLINK\(""http:\/\/evil\.example"",""x""\)",3\.2,false,left,-0\.3,downhill,/);
  const rows = Papa.parse<string[]>(res.body as string, { skipEmptyLines: true }).data.slice(1);
  expect(rows.every((r) => !/^[=+\-@]/.test(r[1]!))).toBe(true);
  expect(rows.map((r) => r[5])).toEqual(["-0.3", "", "1.25"]);

  // Round trip into another account with the suggested mapping: same putts, same green name.
  const other = (await signedUpClient(server)).client;
  const preview = await other.post("/api/csv/putts/preview", form(res.body as string));
  expect(preview.body.suggestedMapping).toEqual({
    date: "date",
    green: "green",
    distance: "distance_m",
    distanceUnit: "m",
    holed: "holed",
    missSide: "miss_side",
    missLength: "miss_length_m",
    missLengthUnit: "m",
    breakType: "break_type",
    session: "session_id",
  });
  const imported = await other.post(
    "/api/csv/putts/import",
    form(res.body as string, { mapping: JSON.stringify(preview.body.suggestedMapping) }),
  );
  expect(imported.body).toMatchObject({ imported: 3, sessionsCreated: 1, greensCreated: 1, errors: [] });
  expect((await other.get("/api/greens")).body.items[0].name).toBe('=HYPERLINK("http://evil.example","x")');
  const again = (await other.get("/api/csv/putts/export")).body as string;
  const strip = (csv: string) => Papa.parse<string[]>(csv, { skipEmptyLines: true }).data.map((r) => r.slice(0, 7));
  expect(strip(again)).toEqual(strip(res.body as string));
});

test("GET /api/csv/sessions/export neutralises text cells and keeps numbers", async () => {
  const { client } = await signedUpClient(server);
  const s = await newSession(client, {
    date: "2024-05-01",
    stimpFt: 9.5,
    conditions: "-wet after rain",
    notes: "@SUM(A1:A9)",
    tags: ["+drill", "dry"],
  });
  await addPutts(client, s, [
    { distanceM: 1, holed: true },
    { distanceM: 2, holed: false },
  ]);
  const res = await client.get("/api/csv/sessions/export?from=2024-01-01");
  expect(res.status).toBe(200);
  expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="?borrowline-sessions-/);
  const [header, row] = Papa.parse<string[]>(res.body as string, { skipEmptyLines: true }).data;
  expect(header).toEqual(["date", "green", "stimp_ft", "conditions", "tags", "notes", "putts", "holed", "session_id"]);
  expect(row!.slice(0, 8)).toEqual(["2024-05-01", "", "9.5", "'-wet after rain", "'+drill; dry", "'@SUM(A1:A9)", "2", "1"]);
  expect(((await client.get("/api/csv/sessions/export?from=2024-06-01")).body as string).trim()).toBe(
    "date,green,stimp_ft,conditions,tags,notes,putts,holed,session_id",
  );
});

/** Every line of every cell: none may start with = + - @ tab or CR (OWASP, "CSV Injection"). */
function formulaLines(csv: string): string[] {
  const cells = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data.flat();
  return cells.flatMap((cell) => cell.split(/\r\n|\n|\r/).filter((line) => /^[=+\-@\t\r]/.test(line)));
}

test("CSV exports neutralise formulas on every line of a multi-line cell, (a legacy multi-line green name too)", async () => {
  const { client } = await signedUpClient(server);
  const notes = "first line\n=1+1\n+2\r\n@SUM(A1:A9)\n-3 short";
  const s = await newSession(client, { date: "2024-05-01", notes });
  await addPutts(client, s, [{ distanceM: 1, holed: true }]);
  // A green named over several lines before names became single-line text (stored directly).
  const green = (await client.post("/api/greens", { name: "Top" })).body.id as string;
  await server.database.db.update(greens).set({ name: "=1+1\n=2+2\n'=3" }).where(eq(greens.id, green));
  const s2 = await newSession(client, { date: "2024-05-02", greenId: green });
  await addPutts(client, s2, [{ distanceM: 2, holed: false }]);

  const sessionsCsv = (await client.get("/api/csv/sessions/export?from=2024-01-01")).body as string;
  expect(formulaLines(sessionsCsv)).toEqual([]);
  const row = Papa.parse<string[]>(sessionsCsv, { skipEmptyLines: true }).data.find((r) => r[0] === "2024-05-01")!;
  expect(row[5]).toBe("first line\n'=1+1\n'+2\r\n'@SUM(A1:A9)\n'-3 short");

  const puttsCsv = (await client.get("/api/csv/putts/export")).body as string;
  expect(formulaLines(puttsCsv)).toEqual([]);
  expect(puttsCsv).toContain("\"'=1+1\n'=2+2\n''=3\"");
});

test("CSV export of another player: 403 for a player, allowed for their squad's coach; signed out every CSV route is 401", async () => {
  const coach = await signedUpClient(server, "coach");
  const member = await signedUpClient(server);
  await makeSquad(server, coach.id, [member.id]);
  await addPutts(member.client, await newSession(member.client), [{ distanceM: 1, holed: true }]);
  const other = (await signedUpClient(server)).client;
  expect((await other.get(`/api/csv/putts/export?playerId=${member.id}`)).status).toBe(403);
  const byCoach = await coach.client.get(`/api/csv/putts/export?playerId=${member.id}`);
  expect(byCoach.status).toBe(200);
  expect((byCoach.body as string).split("\r\n")).toHaveLength(2);
  expect((await other.get("/api/csv/putts/export?from=bad")).status).toBe(400);
  const anon = new HttpClient(server.url);
  expect((await anon.post("/api/csv/putts/preview", form(GOOD))).status).toBe(401);
  expect((await anon.post("/api/csv/putts/import", form(GOOD, { mapping: JSON.stringify(MAPPING) }))).status).toBe(401);
  expect((await anon.get("/api/csv/putts/export")).status).toBe(401);
  expect((await anon.get("/api/csv/sessions/export")).status).toBe(401);
});

test("GET /api/csv/putts/export and /sessions/export: metres to the millimetre, Stimp to 0.01 ft (issue 14: 6 ft was 1.8288000000000002)", async () => {
  const { client } = await signedUpClient(server);
  // 6 ft and a 9.58974… corrected Stimp: what a feet-and-inches player's entries store.
  const s = await newSession(client, { date: "2024-07-01", stimpFt: 9.58974358974359 });
  await addPutts(client, s, [{ distanceM: 6 * 0.3048, holed: false, missSide: "left", missLengthM: -(7 * 0.0254) }]);
  const putts = Papa.parse<string[]>((await client.get("/api/csv/putts/export")).body as string, { skipEmptyLines: true }).data;
  expect(putts[1]![2]).toBe("1.829"); // 1.8288 m
  expect(putts[1]![5]).toBe("-0.178"); // 7 in = 0.1778 m
  const sessions = Papa.parse<string[]>((await client.get("/api/csv/sessions/export")).body as string, { skipEmptyLines: true }).data;
  expect(sessions[1]![2]).toBe("9.59");
});
