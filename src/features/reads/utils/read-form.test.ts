import { expect, test } from "vitest";
import fc from "fast-check";
import { READ_LIMITS } from "#shared/schemas/reads";
import { convertFormValues, fieldLimits, formFieldForApi, fromFormValues, parseNumber, readFormSchema, toFormValues } from "./read-form";
import { defaultReadValues, toReadRequest } from "../../../lib/read-url";

test("limits in the user's units are rounded inward, so what the form accepts the API accepts", () => {
  expect(fieldLimits("distance", "imperial")).toEqual({ min: 1, max: 98.4, unit: "ft" });
  expect(fieldLimits("distance", "metric")).toEqual({ min: 0.3, max: 30, unit: "m" });
  expect(fieldLimits("rollPast", "imperial")).toEqual({ min: 0, max: 118.1, unit: "in" });
  expect(fieldLimits("rollPast", "metric")).toEqual({ min: 0, max: 300, unit: "cm" });
  const d = fieldLimits("distance", "imperial");
  expect(d.min * 0.3048).toBeGreaterThanOrEqual(READ_LIMITS.distanceM.min);
  expect(d.max * 0.3048).toBeLessThanOrEqual(READ_LIMITS.distanceM.max);
});

test("switching units back and forth any number of times gives back exactly what was typed", () => {
  fc.assert(
    fc.property(
      fc.integer({ min: 10, max: 984 }),
      fc.integer({ min: 0, max: 80 }),
      fc.integer({ min: 0, max: 118 }),
      fc.integer({ min: 1, max: 5 }),
      (dTenths, sTenths, rp, trips) => {
        const typed = {
          ...toFormValues(defaultReadValues("imperial"), "imperial").values,
          distance: String(dTenths / 10),
          slope: String(sTenths / 10),
          rollPast: String(rp),
        };
        let state = { values: typed, memory: {} };
        for (let i = 0; i < trips; i++) {
          state = convertFormValues(state.values, "imperial", "metric", state.memory);
          state = convertFormValues(state.values, "metric", "imperial", state.memory);
        }
        expect(state.values.distance).toBe(String(dTenths / 10));
        expect(state.values.slope).toBe(String(sTenths / 10));
        expect(state.values.rollPast).toBe(String(rp));
      },
    ),
  );
});

test("the SI behind a converted field is the exact value typed, not the rounded one shown", () => {
  const typed = { ...toFormValues(defaultReadValues("imperial"), "imperial").values, distance: "11" };
  const metric = convertFormValues(typed, "imperial", "metric", {});
  expect(metric.values.distance).toBe("3.35");
  expect(fromFormValues(metric.values, "metric", metric.memory).distanceM).toBe(11 * 0.3048);
  // Once the user edits the metric field, the new text counts.
  const edited = { ...metric.values, distance: "3.4" };
  expect(fromFormValues(edited, "metric", metric.memory).distanceM).toBe(3.4);
});

test("a field that is not a number keeps its text across a switch", () => {
  const typed = { ...toFormValues(defaultReadValues("imperial"), "imperial").values, distance: "1o" };
  expect(convertFormValues(typed, "imperial", "metric", {}).values.distance).toBe("1o");
});

test("the default read shown in either unit system is valid and solvable", () => {
  for (const units of ["imperial", "metric"] as const) {
    const f = toFormValues(defaultReadValues(units), units);
    expect(readFormSchema(units).safeParse(f.values).success).toBe(true);
    expect(toReadRequest(fromFormValues(f.values, units, f.memory))).not.toBeNull();
  }
  expect(toFormValues(defaultReadValues("imperial"), "imperial").values).toMatchObject({
    distance: "10",
    rollPast: "17",
    slope: "2",
    fallLine: "90",
    stimp: "10",
  });
  expect(toFormValues(defaultReadValues("metric"), "metric").values).toMatchObject({ distance: "3", rollPast: "45" });
});

test("numbers may use a decimal comma; other text is not a number", () => {
  expect(parseNumber("3,5")).toBe(3.5);
  expect(parseNumber(" 12 ")).toBe(12);
  expect(parseNumber("")).toBeNaN();
  expect(parseNumber("12ft")).toBeNaN();
  expect(parseNumber("1e3")).toBeNaN();
});

test("the API's field names map to the form's fields", () => {
  expect(formFieldForApi("distanceM")).toBe("distance");
  expect(formFieldForApi("pace.rollPastM")).toBe("rollPast");
  expect(formFieldForApi("body")).toBeUndefined();
});

test("the form's schema is built once per unit system, and each keeps its own limits", () => {
  expect(readFormSchema("metric")).toBe(readFormSchema("metric"));
  expect(readFormSchema("imperial")).toBe(readFormSchema("imperial"));
  expect(readFormSchema("metric")).not.toBe(readFormSchema("imperial"));
  // 20 is a fine distance in feet and metres; 40 is not a distance in metres a putt is read at (limit 30 m).
  const base = { slope: "2", fallLine: "90", stimp: "10", paceMode: "rollPast" as const, rollPast: "40", entrySpeed: "" };
  expect(readFormSchema("imperial").safeParse({ ...base, distance: "40" }).success).toBe(true);
  const metric = readFormSchema("metric").safeParse({ ...base, distance: "40" });
  expect(metric.success).toBe(false);
  expect(metric.error?.issues.map((i) => i.path.join("."))).toEqual(["distance"]);
});
