// Borrowline's own ladders, offered to every coach to assign or copy. Designed for this product; they
// live in code (not in the database), so their ids are fixed and no one can change them.
import type { Ladder, LadderInput } from "../../../shared/schemas/ladders";
import { feetToMetres } from "../../../shared/units";

// Rungs are set in whole feet, the lengths a golfer says ("3 ft to 6 ft"), stored in metres like every length;
// metres rounded from feet would read as "2 ft 11 in to 5 ft 11 in" (issue 14). Descriptions and notes are fixed
// text shown in whichever units the reader chose, so they name no length in a unit (issue 18: "18 in" in metres).

const builtIn = (id: string, ladder: LadderInput): Ladder => ({
  id,
  builtIn: true,
  ownerId: null,
  createdAt: null,
  updatedAt: null,
  ...ladder,
});

export const BUILT_IN_LADDERS: readonly Ladder[] = [
  builtIn("b0a7c1e0-0000-4000-8000-000000000001", {
    name: "Circle of four",
    description:
      "Four balls around the hole at the same distance, one from each side, so every rung has an uphill, a downhill and both side-hill putts. Hole all four in a row to step back; any miss starts the ladder again.",
    failRule: "restart",
    rungs: [3, 4, 5, 6].map((ft) => ({
      distanceM: feetToMetres(ft),
      balls: 4,
      passRule: { kind: "in-a-row" as const, count: 4 },
      note: "One ball from each side of the hole",
    })),
  }),
  builtIn("b0a7c1e0-0000-4000-8000-000000000002", {
    name: "Pace ladder",
    description:
      "Mid-range putts rolled at a pace that would finish about half a putter's length past the hole. The rungs get longer and need fewer holed; a failed rung sends you down one.",
    failRule: "drop-one",
    rungs: [
      { distanceM: feetToMetres(10), balls: 6, passRule: { kind: "make", made: 2 } },
      { distanceM: feetToMetres(15), balls: 6, passRule: { kind: "make", made: 2 } },
      { distanceM: feetToMetres(20), balls: 8, passRule: { kind: "make", made: 1 } },
      { distanceM: feetToMetres(25), balls: 8, passRule: { kind: "make", made: 1 } },
    ],
  }),
];

export function findBuiltInLadder(id: string): Ladder | undefined {
  return BUILT_IN_LADDERS.find((l) => l.id === id);
}
