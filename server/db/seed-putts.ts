// The demo juniors' practice putts, rolled by the physics model: each putt is one simulated stroke (start line and
// pace from the junior's dispersion that week, the read error and the green's imperfection of the make-probability
// model) on the practice green's gentle slope, recorded as a practice log records it.
import { FOOT_M, simulatePuttOutcomes } from "../../physics";
import type { DEMO_PLAYERS } from "./seed-data";

export const DEMO_WEEKS = 6;
export const DEMO_SESSION_DAYS = [1, 4] as const;
export const DEMO_PUTTS_PER_SESSION = 24;
/** Distances drawn for practice, ft: short putts more often, as juniors practise them. */
const DISTANCES_FT = [3, 3, 4, 4, 5, 5, 6, 6, 8, 8, 10, 12, 15, 20, 25, 30];
const BREAK_TYPES = ["uphill", "downhill", "left-to-right", "right-to-left", "straight"] as const;
/** Fall line (deg, clockwise from ball→hole) for each recorded break type; "straight" putts are on the flat. */
const FALL_LINE_DEG: Record<(typeof BREAK_TYPES)[number], number> = {
  uphill: 180,
  downhill: 0,
  "left-to-right": 90,
  "right-to-left": 270,
  straight: 0,
};
/** The practice green's slope where the juniors putt, % ("mostly 1.5–2.5 %"; the gentler end for practice). */
const SLOPE_PCT = 1.5;

export type DemoPutt = {
  distanceM: number;
  holed: boolean;
  missSide: "left" | "right" | null;
  missLengthM: number | null;
  breakType: (typeof BREAK_TYPES)[number];
};
export type DemoSession = { week: number; dayOffset: number; stimpFt: number; putts: DemoPutt[] };

/** The Stimp of the practice green in a week (ft): slow and damp for the first two weeks. */
export const demoStimpFt = (week: number): number => (week < 2 ? 9.0 : 9.5);

/**
 * Every session of one junior: DEMO_WEEKS weeks × two days × 24 putts, their dispersion moving linearly from the
 * first week's to the last week's. `rand` is the seed's own reproducible generator.
 * @example demoSessions(DEMO_PLAYERS[0], rand).length // 12
 */
export function demoSessions(player: (typeof DEMO_PLAYERS)[number], rand: () => number): DemoSession[] {
  const sessions: DemoSession[] = [];
  for (let week = 0; week < DEMO_WEEKS; week++) {
    const t = week / (DEMO_WEEKS - 1);
    const dispersion = {
      angleDeg: player.angleDeg[0] + t * (player.angleDeg[1] - player.angleDeg[0]),
      pace: player.pace[0] + t * (player.pace[1] - player.pace[0]),
    };
    const stimpFt = demoStimpFt(week);
    for (const dayOffset of DEMO_SESSION_DAYS) {
      const putts: DemoPutt[] = [];
      for (let k = 0; k < DEMO_PUTTS_PER_SESSION; k++) {
        const ft = DISTANCES_FT[Math.floor(rand() * DISTANCES_FT.length)]!;
        const breakType = BREAK_TYPES[Math.floor(rand() * BREAK_TYPES.length)]!;
        const distanceM = ft * FOOT_M;
        const r = simulatePuttOutcomes({
          distanceM,
          slopePct: breakType === "straight" ? 0 : SLOPE_PCT,
          fallLineDeg: FALL_LINE_DEG[breakType],
          stimpFt,
          pace: { rollPastM: player.rollPastM },
          dispersion,
          samples: 1,
          random: rand,
        });
        if (!r.ok) throw new Error("demo green must hold a ball");
        const p = r.putts[0]!;
        putts.push({
          distanceM,
          holed: p.holed,
          missSide: p.missSide,
          missLengthM: p.missLengthM === null ? null : Math.round(p.missLengthM * 100) / 100,
          breakType,
        });
      }
      sessions.push({ week, dayOffset, stimpFt, putts });
    }
  }
  return sessions;
}
