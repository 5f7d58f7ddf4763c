import { expect, test } from "vitest";
import type { BandRate } from "#shared/schemas/stats";
import { feetToMetres } from "#shared/units";
import { playerChartData, squadChartData } from "./squad-chart-data";

const ft = feetToMetres;
const band = (fromFt: number, toFt: number | null, made: number, attempts: number): BandRate => ({
  fromM: ft(fromFt),
  toM: toFt === null ? null : ft(toFt),
  attempts,
  made,
  rate: attempts ? made / attempts : null,
  ci95: attempts ? [Math.max(0, made / attempts - 0.2), Math.min(1, made / attempts + 0.2)] : null,
});

const ivo = { id: "ivo", name: "Ivo Marsh" };
const leena = { id: "leena", name: "Leena Park" };
const sam = { id: "sam", name: "Sam Okoro" };

test("one group per band with a bar per player, rates in percent", () => {
  const rates = new Map([
    ["ivo", [band(0, 3, 9, 10), band(3, 6, 3, 6), band(6, null, 0, 0)]],
    ["leena", [band(0, 3, 7, 8), band(3, 6, 1, 4), band(6, null, 0, 0)]],
  ]);
  const data = squadChartData([ivo, leena], rates, "imperial");
  expect(data.series).toEqual([
    { playerId: "ivo", name: "Ivo Marsh", dataKey: "p0" },
    { playerId: "leena", name: "Leena Park", dataKey: "p1" },
  ]);
  // The 6+ ft band has no putts from anyone: it is left out.
  expect(data.rows).toEqual([
    { band: "0–3 ft", p0: 90, p0n: 10, p1: 87.5, p1n: 8 },
    { band: "3–6 ft", p0: 50, p0n: 6, p1: 25, p1n: 4 },
  ]);
});

test("a player with no putts in a band has no bar there (null, not 0 %)", () => {
  const rates = new Map([
    ["ivo", [band(0, 3, 0, 4), band(3, null, 2, 2)]],
    ["leena", [band(0, 3, 0, 0), band(3, null, 1, 3)]],
  ]);
  const { rows } = squadChartData([ivo, leena], rates, "imperial");
  expect(rows[0]).toMatchObject({ band: "0–3 ft", p0: 0, p1: null, p1n: 0 });
  expect(rows[1]).toMatchObject({ band: "3+ ft", p0: 100, p1: 33.3 });
});

test("players whose rates have not arrived are left out of the series", () => {
  const rates = new Map<string, BandRate[] | undefined>([
    ["ivo", undefined],
    ["sam", [band(0, 3, 1, 2)]],
  ]);
  const data = squadChartData([ivo, sam], rates, "imperial");
  expect(data.series.map((s) => s.name)).toEqual(["Sam Okoro"]);
  expect(data.rows).toEqual([{ band: "0–3 ft", p0: 50, p0n: 2 }]);
});

test("no players or no putts gives an empty chart", () => {
  expect(squadChartData([], new Map(), "metric")).toEqual({ series: [], rows: [] });
  expect(squadChartData([ivo], new Map([["ivo", [band(0, 3, 0, 0)]]]), "metric").rows).toEqual([]);
});

test("metric bands are labelled in metres", () => {
  const rates = new Map([["ivo", [{ fromM: 0, toM: 1, attempts: 4, made: 4, rate: 1, ci95: [0.5, 1] as [number, number] }]]]);
  expect(squadChartData([ivo], rates, "metric").rows[0]?.band).toBe("0–1 m");
});

test("a player's bands carry the rate and its interval in percent", () => {
  expect(playerChartData([band(0, 3, 8, 10), band(3, null, 0, 0)], "imperial")).toEqual([
    { band: "0–3 ft", rate: 80, low: 60, high: 100, attempts: 10, made: 8 },
    { band: "3+ ft", rate: null, low: null, high: null, attempts: 0, made: 0 },
  ]);
});
