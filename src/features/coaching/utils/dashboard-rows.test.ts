import { expect, test } from "vitest";
import type { AssignmentSummary } from "#shared/schemas/assignments";
import type { CoachedPlayer } from "../api/get-coached-players";
import { dashboardRows, filterRows } from "./dashboard-rows";

const summary = (over: Partial<AssignmentSummary>): AssignmentSummary => ({
  id: "a1",
  ladderName: "Three-to-nine",
  player: { id: "ivo", name: "Ivo Marsh" },
  squadId: "s1",
  status: "in-progress",
  overdue: false,
  rungsPassed: 2,
  rungReached: 3,
  rungsTotal: 7,
  currentRung: 3,
  attempts: 4,
  puttsTaken: 13,
  dueDate: "2030-01-01",
  createdAt: "2025-01-01T00:00:00.000Z",
  lastActivityAt: "2025-01-02T00:00:00.000Z",
  completedAt: null,
  ...over,
});

const players: CoachedPlayer[] = [
  {
    id: "ivo",
    name: "Ivo Marsh",
    email: "ivo@x.test",
    squads: [{ id: "s1", name: "Juniors" }],
    assignments: [summary({}), summary({ id: "a2", ladderName: "Lag ladder", status: "assigned", overdue: true })],
  },
  { id: "ruth", name: "Ruth Calder", email: "ruth@x.test", squads: [{ id: "s2", name: "Seniors" }], assignments: [] },
  {
    id: "sam",
    name: "Sam Okoro",
    email: "sam@x.test",
    squads: [{ id: "s1", name: "Juniors" }],
    assignments: [summary({ id: "a3", player: { id: "sam", name: "Sam Okoro" }, status: "completed", rungReached: 7 })],
  },
];

test("one row per ladder given, and one for a player without a ladder", () => {
  const rows = dashboardRows(players);
  expect(rows.map((r) => [r.playerName, r.ladderName, r.status])).toEqual([
    ["Ivo Marsh", "Three-to-nine", "in-progress"],
    ["Ivo Marsh", "Lag ladder", "overdue"],
    ["Ruth Calder", null, "no-ladder"],
    ["Sam Okoro", "Three-to-nine", "completed"],
  ]);
  expect(rows[3]).toMatchObject({ rungReached: 7, rungsTotal: 7 });
});

test("filters combine squad, status and text", () => {
  const rows = dashboardRows(players);
  expect(filterRows(rows, { squadId: "s1", status: "", text: "" })).toHaveLength(3);
  expect(filterRows(rows, { squadId: "", status: "overdue", text: "" }).map((r) => r.ladderName)).toEqual(["Lag ladder"]);
  expect(filterRows(rows, { squadId: "", status: "", text: "LAG" }).map((r) => r.playerName)).toEqual(["Ivo Marsh"]);
  expect(filterRows(rows, { squadId: "s2", status: "completed", text: "" })).toEqual([]);
});
