/**
 * Read training: the levels, the scoring rule and the evaluation of one attempt. Client and server both call
 * `evaluateAttempt`, so the score a player sees on the green is the score the server stores (the server never
 * takes a score from the client).
 *
 * A player's read is an aim (the aim offset at the hole's distance, + = right of the hole) and a pace, given
 * as a flat-putt length: the length of a flat putt (same Stimp, same 0.45 m past) their stroke would suit. The
 * flat-putt length is the pace currency because it does not depend on the slope, so judging how much the slope
 * adds or takes away is part of the read. (A roll-past guess is accepted too: it stands for the stroke that rolls
 * that far past on the true line.)
 *
 * The true read is the physics model's read at the target pace of 0.45 m past (common practice).
 */
import { flatPuttLengthM as flatLength, rollingDecelFromStimp, simulateRoll, solveRead, type BreakDirection } from "../physics";
import { longUnitLabel, metresToHoleWidths, toLongUnit, type UnitSystem } from "./units";

export const TRAINING_LEVEL_IDS = ["gentle", "club", "testing", "by-eye"] as const;
export type TrainingLevelId = (typeof TRAINING_LEVEL_IDS)[number];

export type Range = readonly [min: number, max: number];
export type TrainingLevel = {
  readonly id: TrainingLevelId;
  readonly label: string;
  readonly distanceM: Range;
  readonly slopePct: Range;
  readonly stimpFt: Range;
  /**
   * False for a level read from the picture alone: the slope and the fall line are not given as numbers or words
   * until the line is revealed (the player sees only the 3D green, its shading and contours).
   */
  readonly slopeGiven: boolean;
};

/** The ranges each level draws its putts from (inclusive). Our own grading, not a published one. */
export const TRAINING_LEVELS: Readonly<Record<TrainingLevelId, TrainingLevel>> = {
  gentle: { id: "gentle", label: "Gentle", distanceM: [1, 4], slopePct: [1, 2], stimpFt: [9, 11], slopeGiven: true },
  club: { id: "club", label: "Club", distanceM: [2, 8], slopePct: [1, 3], stimpFt: [8.5, 11.5], slopeGiven: true },
  testing: { id: "testing", label: "Testing", distanceM: [3, 12], slopePct: [2, 4], stimpFt: [9, 12.5], slopeGiven: true },
  "by-eye": { id: "by-eye", label: "By eye", distanceM: [2, 8], slopePct: [1, 3], stimpFt: [8.5, 11.5], slopeGiven: false },
};

/** Putt lengths of a range in the user's units, rounded to whole feet or metres: "7–26 ft", "2–8 m". */
function lengthRangeWords([min, max]: Range, units: UnitSystem): string {
  const f = (m: number) => Math.round(toLongUnit(m, units));
  return `${f(min)}–${f(max)} ${longUnitLabel(units)}`;
}

/** What a level hands out, in the user's units ("1–3 % slopes, 7–26 ft putts"). */
export function levelDescription(level: TrainingLevelId, units: UnitSystem): string {
  const l = TRAINING_LEVELS[level];
  const lengths = `${lengthRangeWords(l.distanceM, units)} putts`;
  if (!l.slopeGiven) return `${lengths}; slope and fall line read from the green itself`;
  return `${l.slopePct[0]}–${l.slopePct[1]} % slopes, ${lengths}`;
}

/** The pace the true read is solved for: 0.45 m past the hole if it missed (common practice). */
export const TARGET_ROLL_PAST_M = 0.45;
/** Aim error, in hole widths, at which aim alone brings the score down to 50. */
export const AIM_HALF_SCORE_HOLE_WIDTHS = 2;
/** Pace error, as a share of the putt's length, at which pace alone brings the score down to 50. */
export const PACE_HALF_SCORE_FRACTION = 0.2;
/** A read whose ball drops scores at least this much, whatever the numbers say. */
export const HOLED_MIN_SCORE = 80;

export type TrainingPutt = { distanceM: number; slopePct: number; fallLineDeg: number; stimpFt: number };
export type TrainingGuess = { aimOffsetM: number; flatPuttLengthM: number } | { aimOffsetM: number; rollPastM: number };

export type ScoreInput = {
  /** Player's aim offset minus the true aim offset, m (signed; only the size counts). */
  aimErrorM: number;
  /** Player's flat-putt length minus the true one, m (signed; only the size counts). */
  paceErrorM: number;
  distanceM: number;
  /** Whether the player's own ball, rolled forward, drops. */
  holed: boolean;
};

/**
 * The 0–100 score of a read: 100 / (1 + (a / 2)² + (p / 0.2)²), rounded, where a is the aim error in hole
 * widths and p the pace error as a share of the putt's length. So one hole width off (pace perfect) scores 80,
 * two hole widths 50, four 20; a pace 10 % off scores 80, 20 % off 50. It falls smoothly and never rises as
 * either error grows. A read whose ball drops scores at least {@link HOLED_MIN_SCORE}.
 * @example readScore({ aimErrorM: 0.108, paceErrorM: 0, distanceM: 3, holed: false }) // ≈ 80
 */
export function readScore({ aimErrorM, paceErrorM, distanceM, holed }: ScoreInput): number {
  const a = metresToHoleWidths(Math.abs(aimErrorM)) / AIM_HALF_SCORE_HOLE_WIDTHS;
  const p = Math.abs(paceErrorM) / distanceM / PACE_HALF_SCORE_FRACTION;
  const raw = 100 / (1 + a * a + p * p);
  const score = Number.isFinite(raw) ? raw : 0;
  return Math.round(holed ? Math.max(score, HOLED_MIN_SCORE) : score);
}

/** Start line (degrees, + = right) through an aim offset at the hole's distance. */
export function startLineFromAimDeg(aimOffsetM: number, distanceM: number): number {
  return (Math.atan2(aimOffsetM, distanceM) * 180) / Math.PI;
}

/**
 * Launch speed (m/s) of a flat putt of this length at this Stimp played to finish `rollPastM` past (default the
 * target 0.45 m): v = √(2·a_r·(L + P)) (constant deceleration, derived).
 */
export function launchSpeedForFlatPutt(flatPuttLengthM: number, stimpFt: number, rollPastM: number = TARGET_ROLL_PAST_M): number {
  return Math.sqrt(2 * rollingDecelFromStimp(stimpFt) * Math.max(0, flatPuttLengthM + rollPastM));
}

export type TrueRead = {
  aimOffsetM: number;
  startLineDeg: number;
  launchSpeedMps: number;
  rollPastM: number;
  flatPuttLengthM: number;
  entrySpeedMps: number;
  breaks: BreakDirection;
  path: [number, number][];
};

export type PlayerRoll = {
  aimOffsetM: number;
  startLineDeg: number;
  launchSpeedMps: number;
  flatPuttLengthM: number;
  holed: boolean;
  outcome: "holed" | "lip-out" | "miss";
  /** Where the ball would stop with the hole covered, [x, y] m in the putt frame. */
  restM: [number, number];
  /** Rest point relative to the hole: + past / − short (along the line), + right / − left. */
  finishPastM: number;
  finishSideM: number;
  /** The ball's closest pass to the hole centre, m. */
  closestM: number;
  path: [number, number][];
  samples: { timeS: number[]; xM: number[]; yM: number[] };
  /** When the ball drops, s from the stroke (null when it does not). */
  holeTimeS: number | null;
};

export type Evaluation =
  | {
      ok: true;
      score: number;
      aimErrorM: number;
      paceErrorM: number;
      aimErrorHoleWidths: number;
      truth: TrueRead;
      yours: PlayerRoll;
    }
  | { ok: false; reason: "cannot-stop"; message: string };

/**
 * Evaluate one read: solve the true read at {@link TARGET_ROLL_PAST_M}, roll the player's ball forward from
 * their start line and launch speed (simulateRoll), and score it with {@link readScore}.
 * Aim error = player's aim offset − true aim offset; pace error = player's flat-putt length − the true one.
 * @example evaluateAttempt({ distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 }, { aimOffsetM: -0.2, flatPuttLengthM: 3.4 })
 */
export function evaluateAttempt(putt: TrainingPutt, guess: TrainingGuess): Evaluation {
  const solved = solveRead({ ...putt, pace: { rollPastM: TARGET_ROLL_PAST_M } });
  if (!solved.ok) return { ok: false, reason: "cannot-stop", message: solved.message };
  const t = solved.read;
  let launchSpeedMps: number;
  if ("flatPuttLengthM" in guess) {
    launchSpeedMps = launchSpeedForFlatPutt(guess.flatPuttLengthM, putt.stimpFt);
  } else {
    const atPace = solveRead({ ...putt, pace: { rollPastM: guess.rollPastM } });
    if (!atPace.ok) return { ok: false, reason: "cannot-stop", message: atPace.message };
    launchSpeedMps = atPace.read.launchSpeedMps;
  }
  const startLineDeg = startLineFromAimDeg(guess.aimOffsetM, putt.distanceM);
  const rolled = simulateRoll({ ...putt, launchSpeedMps, startLineDeg });
  if (!rolled.ok) return { ok: false, reason: "cannot-stop", message: rolled.message };
  const r = rolled.roll;
  const flatPuttLengthM = flatLength(launchSpeedMps, rollingDecelFromStimp(putt.stimpFt), TARGET_ROLL_PAST_M);
  // Training levels keep start lines modest, so the true aim is always an offset (D·tan of the start line).
  const trueAimM = t.aimOffsetM ?? putt.distanceM * Math.tan((t.startLineDeg * Math.PI) / 180);
  const aimErrorM = guess.aimOffsetM - trueAimM;
  const trueFlatM = flatLength(t.launchSpeedMps, rollingDecelFromStimp(putt.stimpFt), TARGET_ROLL_PAST_M);
  const paceErrorM = flatPuttLengthM - trueFlatM;
  const score = readScore({ aimErrorM, paceErrorM, distanceM: putt.distanceM, holed: r.capture.holed });
  return {
    ok: true,
    score,
    aimErrorM,
    paceErrorM,
    aimErrorHoleWidths: metresToHoleWidths(Math.abs(aimErrorM)),
    truth: {
      aimOffsetM: trueAimM,
      startLineDeg: t.startLineDeg,
      launchSpeedMps: t.launchSpeedMps,
      rollPastM: t.rollPastM,
      flatPuttLengthM: trueFlatM,
      entrySpeedMps: t.entrySpeedMps,
      breaks: t.breaks,
      path: t.path,
    },
    yours: {
      aimOffsetM: guess.aimOffsetM,
      startLineDeg,
      launchSpeedMps,
      flatPuttLengthM,
      holed: r.capture.holed,
      outcome: r.capture.outcome,
      restM: r.restM,
      finishPastM: r.restM[1] - putt.distanceM,
      finishSideM: r.restM[0],
      closestM: r.closestApproach.distanceM,
      path: r.path,
      samples: { timeS: r.samples.timeS, xM: r.samples.xM, yM: r.samples.yM },
      holeTimeS: r.capture.holed ? r.closestApproach.timeS : null,
    },
  };
}

/** Whether a putt lies inside a level's ranges (the server refuses attempts that do not). */
export function puttFitsLevel(putt: TrainingPutt, level: TrainingLevelId): Partial<Record<keyof TrainingPutt, string>> {
  const l = TRAINING_LEVELS[level];
  const out: Partial<Record<keyof TrainingPutt, string>> = {};
  const eps = 1e-9;
  const check = (key: "distanceM" | "slopePct" | "stimpFt", [min, max]: Range, unit: string) => {
    const v = putt[key];
    if (v < min - eps || v > max + eps) out[key] = `${l.label} putts have ${key} from ${min} to ${max} ${unit}`;
  };
  check("distanceM", l.distanceM, "m");
  check("slopePct", l.slopePct, "%");
  check("stimpFt", l.stimpFt, "ft");
  return out;
}
