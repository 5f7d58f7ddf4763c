// The answer in words, in the user's units. Signed lengths: + = the golfer's right.
import { HOLE_DIAMETER_M, formatLength, toShortUnit, type UnitSystem } from "#shared/units";
import {
  AIM_CENTRE_M,
  STOPPED_AT_HOLE_MPS,
  formatSpeed,
  holeWidthsWords,
  isLongAim,
  paceWords,
  sideOf,
  startLineAimText,
  stimpText,
} from "#shared/format";

export { paceWords };

const HOLE_RADIUS_M = HOLE_DIAMETER_M / 2;
/** Past this the start line is so wide that an offset "at the hole's distance" stops meaning much. */
const WIDE_START_LINE_DEG = 60;

export type AimWords = {
  /** The big line: "Start it 8.7 in outside the left edge". */
  headline: string;
  /** The same aim from the centre: "2.5 hole widths (10.8 in) left of centre". */
  detail: string;
  /** "5.2° left of the straight line to the hole". */
  startLine: string;
};

/** An aim as a golfer says it: whole inches (half inches under 2 in), whole centimetres (tenths under 5 cm); from a
 *  yard or a metre on, as a length ("10 ft 9 in", "3.28 m"): a long breaking putt is not aimed 129 in outside. */
export function formatAim(m: number, units: UnitSystem): string {
  if (isLongAim(m, units)) return formatLength(Math.abs(m), units);
  const v = toShortUnit(Math.abs(m), units);
  if (units === "imperial") return `${v < 2 ? String(Math.round(v * 2) / 2) : Math.round(v)} in`;
  return `${v < 5 ? v.toFixed(1) : Math.round(v)} cm`;
}

export function startLineWords(startLineDeg: number): string {
  const a = Math.abs(startLineDeg);
  if (a < 0.05) return "Start line straight at the hole";
  return `Start line ${a.toFixed(1)}° ${sideOf(startLineDeg)} of the straight line to the hole`;
}

export function aimWords(aimOffsetM: number | null, startLineDeg: number, units: UnitSystem): AimWords {
  const startLine = startLineWords(startLineDeg);
  if (aimOffsetM === null || Math.abs(startLineDeg) > WIDE_START_LINE_DEG) {
    return {
      headline: `Start it ${startLineAimText(startLineDeg)}`,
      detail:
        Math.abs(startLineDeg) >= 90
          ? "Square to the hole or back up the slope: judge it by the start direction, not a spot beside the hole."
          : "A very wide line: judge it by the start direction, not a spot beside the hole.",
      startLine,
    };
  }
  const abs = Math.abs(aimOffsetM);
  if (abs < AIM_CENTRE_M) return { headline: "Aim at the centre of the hole", detail: "No borrow to play", startLine };
  const s = sideOf(aimOffsetM);
  const fromCentre = `${holeWidthsWords(aimOffsetM)} (${formatAim(aimOffsetM, units)}) ${s} of centre`;
  if (abs <= HOLE_RADIUS_M) return { headline: `Aim inside the ${s} edge`, detail: fromCentre, startLine };
  return { headline: `Start it ${formatAim(abs - HOLE_RADIUS_M, units)} outside the ${s} edge`, detail: fromCentre, startLine };
}

export type CaptureSummary = { holed: boolean; outcome: "holed" | "lip-out" | "miss"; maxCaptureSpeedMps: number; marginMps: number };

/** Within this of the hole's limit a firmer stroke would lip out: "only just" (0.25 m/s, our own threshold). */
const ONLY_JUST_MPS = 0.25;

/**
 * The ball at the hole in a golfer's words (capture model: Holmes 1991, see docs/sources.md): a stopped ball is
 * said in words, never "0.00 m/s"; a rolling one in the user's speed unit (ft/s in feet and inches).
 */
export function captureWords(
  entrySpeedMps: number,
  capture: CaptureSummary,
  units: UnitSystem,
): { entry: string; verdict: string; tone: "ok" | "warn" } {
  const limit = formatSpeed(capture.maxCaptureSpeedMps, units);
  if (entrySpeedMps < STOPPED_AT_HOLE_MPS) {
    return capture.outcome === "miss"
      ? { entry: "Runs out of pace at the hole", verdict: "It does not pass over the hole", tone: "warn" }
      : { entry: "Just reaches the hole and topples in", verdict: "A dying pace: any softer and it stays out", tone: "ok" };
  }
  const entry = `Still rolling at the hole (${formatSpeed(entrySpeedMps, units)})`;
  if (capture.outcome === "holed") {
    return {
      entry,
      verdict:
        capture.marginMps < ONLY_JUST_MPS
          ? `It drops, but only just: any firmer and it lips out (the hole holds up to ${limit})`
          : `The hole holds it, with room to roll it firmer (up to ${limit} drops)`,
      tone: "ok",
    };
  }
  if (capture.outcome === "lip-out") {
    return { entry, verdict: `Too fast to drop: it lips out or jumps the hole (it holds up to ${limit}); roll it softer`, tone: "warn" };
  }
  return { entry, verdict: "It does not pass over the hole", tone: "warn" };
}

/** The 422 "cannot stop" answer, in words: "On an 8 % slope at Stimp 10 the ball would not stop — …". */
export function cannotStopWords(slopePct: number, stimpFt: number, steepestPct: number | undefined): string {
  const slope = formatPct(slopePct);
  const article = aOrAn(slope);
  const tail = steepestPct !== undefined ? ` — the steepest it stops on is ${steepestPct.toFixed(1)} %` : "";
  return `On ${article} ${slope} % slope at ${stimpText(stimpFt)} the ball would not stop${tail}.`;
}

/** "an 8 ft", "an 11 ft", "an 18 ft", but "a 10 ft" (numbers read aloud). */
export function aOrAn(numberText: string): "a" | "an" {
  return /^(8|11(?!\d)|18(?!\d))/.test(numberText) ? "an" : "a";
}

function formatPct(n: number): string {
  return String(Math.round(n * 10) / 10);
}

/** One line describing a read's inputs: "10 ft, 2 % falls to the right, Stimp 10". */
export function readInputSummary(distanceM: number, slopePct: number, direction: string, stimpFt: number, units: UnitSystem): string {
  return `${formatLength(distanceM, units)}, ${formatPct(slopePct)} % ${direction}, ${stimpText(stimpFt)}`;
}
