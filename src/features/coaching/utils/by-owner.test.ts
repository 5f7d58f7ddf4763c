import { expect, test } from "vitest";
import { splitByOwner } from "./by-owner";

test("an admin's own squads are theirs; other coaches' are set apart, not called theirs", () => {
  const squads = [
    { id: "a", coach: { id: "admin" } },
    { id: "b", coach: { id: "dana" } },
    { id: "c", coach: { id: "lee" } },
  ];
  const { own, others } = splitByOwner(squads, "admin", (s) => s.coach.id);
  expect(own.map((s) => s.id)).toEqual(["a"]);
  expect(others.map((s) => s.id)).toEqual(["b", "c"]);
});
