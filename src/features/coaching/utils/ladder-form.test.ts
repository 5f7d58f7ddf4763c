import { expect, test } from "vitest";
import {
  emptyLadderForm,
  formToLadderInput,
  ladderToForm,
  nextRung,
  serverFieldsToForm,
  validateLadderForm,
  type LadderFormValues,
} from "./ladder-form";

const form = (rungs: Partial<LadderFormValues["rungs"][number]>[], extra: Partial<LadderFormValues> = {}): LadderFormValues => ({
  name: "Short game",
  description: "",
  failRule: "drop-one",
  rungs: rungs.map((r) => ({ distance: "3", balls: "5", passKind: "make", need: "3", breakType: "", note: "", ...r })),
  ...extra,
});

test("feet in the form become metres for the API, and come back as the same feet", () => {
  const input = formToLadderInput(
    form([{ distance: "6" }, { distance: "7.5", passKind: "in-a-row", need: "2", breakType: "uphill", note: " low side " }]),
    "imperial",
  );
  expect(input.rungs[0]).toEqual({ distanceM: 1.829, balls: 5, passRule: { kind: "make", made: 3 } });
  expect(input.rungs[1]).toEqual({
    distanceM: 2.286,
    balls: 5,
    passRule: { kind: "in-a-row", count: 2 },
    breakType: "uphill",
    note: "low side",
  });
  expect(ladderToForm({ ...input, failRule: "drop-one" }, "imperial").rungs.map((r) => r.distance)).toEqual(["6", "7.5"]);
});

test("more holed than balls gets the shared schema's message on the rule field", () => {
  const result = validateLadderForm(form([{ balls: "2", need: "3" }]), "imperial");
  expect(result).toEqual({ ok: false, errors: { "rungs.0.need": "Needs 3 holed but the rung has only 2 balls" } });
});

test("a missing name, an empty distance and a distance off the green are each named in the user's unit", () => {
  const result = validateLadderForm(form([{ distance: "" }, { distance: "0.5" }, { distance: "120" }], { name: " " }), "imperial");
  expect(result.ok).toBe(false);
  if (result.ok) return;
  expect(result.errors).toMatchObject({
    name: "Give the ladder a name",
    "rungs.0.distance": "Enter the distance in ft",
    "rungs.1.distance": "At least 1 ft",
    "rungs.2.distance": "At most 98 ft 5 in",
  });
});

test("a ladder without rungs is refused with the schema's words", () => {
  expect(validateLadderForm(form([]), "metric")).toEqual({ ok: false, errors: { rungs: "A ladder needs at least one rung" } });
});

test("a new rung steps one foot (or half a metre) further with the same rule", () => {
  expect(nextRung(form([{ distance: "6", need: "2" }]).rungs[0], "imperial")).toMatchObject({ distance: "7", need: "2" });
  expect(nextRung(emptyLadderForm("metric").rungs[0], "metric").distance).toBe("1.5");
});

test("server field errors land on the same form fields", () => {
  expect(serverFieldsToForm({ "rungs.1.passRule": "Needs 4", "rungs.0.distanceM": "Too far", name: "Taken" })).toEqual({
    "rungs.1.need": "Needs 4",
    "rungs.0.distance": "Too far",
    name: "Taken",
  });
});
