import { expect, test } from "vitest";
import type { SquadOverview } from "#shared/schemas/squads";
import { overviewRows, sgTrendWord } from "./overview-rows";

const overview: SquadOverview = {
  squad: { id: "s", name: "Juniors" },
  days: 28,
  recentFrom: "2026-11-05",
  today: "2026-12-02",
  bands: [
    { fromM: 0, toM: 1 },
    { fromM: 1, toM: null },
  ],
  players: [
    {
      id: "p1",
      name: "Ivo",
      email: "ivo@example.test",
      recent: { sessions: 3, putts: 60, strokesGainedPerPutt: -0.05, lastSession: "2026-12-01" },
      past: { putts: 80, strokesGainedPerPutt: -0.1 },
      bands: [
        { recent: { attempts: 20, made: 18, rate: 0.9 }, past: { attempts: 30, made: 24, rate: 0.8 } },
        { recent: { attempts: 4, made: 1, rate: 0.25 }, past: { attempts: 50, made: 20, rate: 0.4 } },
      ],
      ladders: {
        active: 1,
        completed: 0,
        overdue: 1,
        latest: { name: "Three-to-nine", status: "in-progress", overdue: true, rungReached: 3, rungsTotal: 5 },
      },
    },
  ],
};

test("a band's change against the player's own past is given only when both periods have enough putts", () => {
  const [row] = overviewRows(overview);
  expect(row!.bands[0]!.change).toBeCloseTo(0.1, 12);
  expect(row!.bands[1]!.change).toBeNull();
  expect(row!.sgChange).toBeCloseTo(0.05, 12);
  expect(row!.ladder).toBe("Three-to-nine: rung 3 of 5, overdue");
  expect(row!.ladderOrder).toBe(0);
});

test("strokes-gained trend words", () => {
  expect(sgTrendWord(0.05)).toBe("Improving");
  expect(sgTrendWord(-0.03)).toBe("Slipping");
  expect(sgTrendWord(0.01)).toBe("Steady");
  expect(sgTrendWord(null)).toBe("Not enough putts");
});
