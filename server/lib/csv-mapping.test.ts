import { expect, test } from "vitest";
import { HttpError } from "./http-error";
import { convertRow, parseNumber, readMapping, suggestMapping } from "./csv-mapping";

const headers = ["Date", "Distance (ft)", "Made", "Side", "Leave (in)", "Break", "Green"];

test("a mapping is guessed from the headers, in the reader's units", () => {
  const m = suggestMapping(headers, "imperial");
  expect(m).toMatchObject({ date: "Date", distance: "Distance (ft)", holed: "Made", distanceUnit: "ft" });
});

test("only plain decimals are numbers (no hex, exponents or words)", () => {
  expect(parseNumber(" 1.5 ")).toBe(1.5);
  expect(parseNumber("-.4")).toBe(-0.4);
  expect(parseNumber("0x1A")).toBeNull();
  expect(parseNumber("1e3")).toBeNull();
  expect(parseNumber("")).toBeNull();
});

test("a row converts feet and inches to metres (1 ft = 0.3048 m, 1 in = 0.0254 m, by definition) and groups by date and green", () => {
  const { mapping, col } = readMapping(
    JSON.stringify({
      date: "Date",
      distance: "Distance (ft)",
      distanceUnit: "ft",
      holed: "Made",
      missSide: "Side",
      missLength: "Leave (in)",
      missLengthUnit: "in",
      breakType: "Break",
      green: "Green",
    }),
    headers,
  );
  const out = convertRow(["2026-03-01", "10", "no", "L", "-18", "left to right", "Home"], col, mapping);
  expect(out.errors).toEqual([]);
  expect(out.putt!.distanceM).toBeCloseTo(3.048, 9);
  expect(out.putt!.missLengthM).toBeCloseTo(-0.4572, 9);
  expect(out.putt).toMatchObject({ holed: false, missSide: "left", breakType: "left-to-right", greenName: "Home", date: "2026-03-01" });
  expect(out.putt!.group).toBe("2026-03-01\u0000home");
});

test("a bad row names each bad field; a holed putt with a miss side is refused", () => {
  const { mapping, col } = readMapping(
    JSON.stringify({ date: "Date", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made", missSide: "Side" }),
    headers,
  );
  const bad = convertRow(["01/03/2026", "ten", "maybe", "up", "", "", ""], col, mapping);
  expect(bad.errors.map((e) => e.field).sort()).toEqual(["date", "distance", "holed", "missSide"]);
  const holedWithSide = convertRow(["2026-03-01", "5", "yes", "left", "", "", ""], col, mapping);
  expect(holedWithSide.putt).toBeUndefined();
  expect(holedWithSide.errors.length).toBeGreaterThan(0);
});

test("a mapping naming a column the file lacks is a 400 naming mapping.<key>", () => {
  try {
    readMapping(JSON.stringify({ date: "Day", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made" }), headers);
    expect.unreachable();
  } catch (e) {
    expect(e).toBeInstanceOf(HttpError);
    expect((e as HttpError).status).toBe(400);
    expect((e as HttpError).fields).toHaveProperty(["mapping.date"]);
  }
  expect(() => readMapping("{not json", headers)).toThrow(HttpError);
});
