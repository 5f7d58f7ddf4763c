import { expect, test } from "vitest";
import { ApiError } from "../../../lib/api-client";
import { fieldLabel, initialMapping, toCsvMapping, uploadProblem, validRowCount } from "./csv-mapping";

const headers = ["Date", "Distance (ft)", "Made", "Side", "Leave (in)", "Break", "Green"];

test("the suggestion fills the selects; a suggested column the file lacks is left empty", () => {
  const state = initialMapping(
    { headers, suggestedMapping: { date: "Date", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made", green: "Nope" } },
    "m",
  );
  expect(state).toMatchObject({
    date: "Date",
    distance: "Distance (ft)",
    distanceUnit: "ft",
    holed: "Made",
    green: "",
    missLengthUnit: "",
  });
  expect(initialMapping({ headers, suggestedMapping: {} }, "m").distanceUnit).toBe("m");
});

test("a mapping without a required field, or with a column used twice, is not sent", () => {
  const base = initialMapping(
    { headers, suggestedMapping: { date: "Date", distance: "Distance (ft)", distanceUnit: "ft", holed: "Made" } },
    "ft",
  );
  expect(toCsvMapping({ ...base, holed: "" })).toEqual({ ok: false, missing: ["Holed"], duplicates: [] });
  expect(toCsvMapping({ ...base, green: "Date" })).toEqual({ ok: false, missing: [], duplicates: ["Date"] });
  expect(toCsvMapping({ ...base, missLength: "Leave (in)", missLengthUnit: "in", breakType: "Break" })).toEqual({
    ok: true,
    mapping: {
      date: "Date",
      distance: "Distance (ft)",
      distanceUnit: "ft",
      holed: "Made",
      missLength: "Leave (in)",
      missLengthUnit: "in",
      breakType: "Break",
    },
  });
});

test("valid rows are the rows without any error, counting a row with two errors once", () => {
  const errors = [
    { row: 2, line: 3, field: "date", message: "missing date" },
    { row: 2, line: 3, field: "distance", message: "x" },
    { row: 5, line: 6, field: "holed", message: "y" },
  ];
  expect(validRowCount(10, errors)).toBe(8);
  expect(fieldLabel("missLength")).toBe("Miss length");
  expect(fieldLabel("row")).toBe("whole row");
});

test("too large and not-CSV uploads get plain words", () => {
  expect(uploadProblem(new ApiError(413, "payload_too_large", "The file is larger than 1 MB."))).toMatch(/too large: the limit is 1 MB/);
  expect(uploadProblem(new ApiError(415, "unsupported_media_type", "Upload a CSV file (got image/png)."))).toMatch(/not a CSV/);
  expect(uploadProblem(new ApiError(400, "bad_request", "The file has no header row.", { file: "no header row" }))).toBe(
    "The file has no header row. (no header row)",
  );
});
