// The invented demo scenario of the product brief: no real person, club or course.
import { FOOT_M } from "../../physics/constants";
import type { LadderInput } from "../../shared/schemas/ladders";

export const DEMO_PASSWORD = "larkspur-demo";

export const DEMO_ADMIN = { name: "Borrowline Admin", email: "admin@borrowline.example" };
export const DEMO_COACH = { name: "Dana Whitcombe", email: "dana@larkspur.example" };
/**
 * Each junior's stroke, as the physics model's dispersion (start-line σ in degrees, pace σ as a fraction of the roll
 * length) in week 1 and in the last week, improving steadily between; and the pace they putt to (roll-past, m).
 * Their putts are rolled by the model (server/db/seed-putts.ts), read error and green included, so the make rates
 * are those of the model: about the amateur rates of docs/sources.md, improving over the weeks. Invented values.
 */
export const DEMO_PLAYERS = [
  { name: "Ivo Marsh", email: "ivo@larkspur.example", angleDeg: [2.0, 1.5], pace: [0.2, 0.14], rollPastM: 0.4 },
  { name: "Leena Park", email: "leena@larkspur.example", angleDeg: [1.7, 1.4], pace: [0.17, 0.13], rollPastM: 0.45 },
  { name: "Sam Okoro", email: "sam@larkspur.example", angleDeg: [2.2, 1.6], pace: [0.22, 0.15], rollPastM: 0.35 },
  { name: "Ruth Calder", email: "ruth@larkspur.example", angleDeg: [1.9, 1.5], pace: [0.19, 0.14], rollPastM: 0.5 },
] as const;

export const DEMO_GREEN = {
  name: "Top green",
  locationNote: "Larkspur Heath golf club, practice green by the first tee. Mostly 1.5–2.5 % slope.",
  stimpFt: 9.5,
};

export const DEMO_SQUAD = { name: "Larkspur juniors", description: "Saturday-morning junior squad at Larkspur Heath." };

export const DEMO_LADDERS: LadderInput[] = [
  {
    name: "Three-to-nine",
    description: "Short putts that must be holed, shortest first: pass every rung before moving back.",
    failRule: "drop-one",
    rungs: [3, 4, 5, 6, 7, 8, 9].map((ft) => ({
      distanceM: Math.round(ft * FOOT_M * 100) / 100,
      balls: 5,
      passRule: ft <= 5 ? { kind: "in-a-row" as const, count: 3 } : { kind: "make" as const, made: 3 },
    })),
  },
  {
    name: "Lag ladder",
    description: "Long putts for pace: hole one of six to move on, and leave every miss inside a putter length.",
    failRule: "repeat",
    rungs: [15, 20, 25].map((ft) => ({
      distanceM: Math.round(ft * FOOT_M * 100) / 100,
      balls: 6,
      passRule: { kind: "make" as const, made: 1 },
      note: "Judge the pace: every miss should finish within a putter length past the hole",
    })),
  },
];
