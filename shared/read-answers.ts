// The read calculator's answers in the API's shape, built from the physics: the server sends them
// (POST /api/reads/solve, /api/reads/chart), and the browser builds the very same when it has no connection
// (issue 14: the read and the break chart work offline). Imports the physics files it needs, not the index, so
// the browser's offline chunk stays small.
import { breakChart } from "../physics/break-chart";
import type { Read } from "../physics/read-types";
import { solveRead } from "../physics/solve-read";
import { ERROR_CODES, type ApiErrorBody } from "./errors";
import type { ChartRequest, ChartResponse, ReadRequest, ReadResponse } from "./schemas/reads";

export function toReadResponse(read: Read): ReadResponse {
  const {
    launchSpeedMps,
    startLineDeg,
    aimOffsetM,
    aimGiven,
    aimNote,
    entrySpeedMps,
    rollPastM,
    flatPuttLengthM,
    breaks,
    capture,
    path,
    model,
  } = read;
  return {
    launchSpeedMps,
    startLineDeg,
    aimOffsetM,
    aimGiven,
    aimNote,
    entrySpeedMps,
    rollPastM,
    flatPuttLengthM,
    breaks,
    capture: {
      holed: capture.holed,
      outcome: capture.outcome,
      maxCaptureSpeedMps: capture.maxCaptureSpeedMps,
      marginMps: capture.marginMps,
    },
    path,
    model: {
      name: model.name,
      v0Mps: model.v0Mps,
      rollingDecelMps2: model.rollingDecelMps2,
      gravityDecelMps2: model.gravityDecelMps2,
      maxStoppableSlopePct: model.maxStoppableSlopePct,
    },
  };
}

/**
 * The 422 body of a ball that cannot stop, the same for the planar and the surface read: the physics message, the
 * field to change, and `details.reason: "cannot-stop"` with the steepest stoppable slope (%) as a number.
 */
export function cannotStopBody(message: string, field: string, stimpFt: number, maxStoppableSlopePct: number): ApiErrorBody {
  return {
    error: {
      code: ERROR_CODES.unprocessable,
      message,
      fields: { [field]: `too steep to stop a ball at Stimp ${stimpFt} ft (steepest: ${maxStoppableSlopePct.toFixed(1)} %)` },
      details: { reason: "cannot-stop", maxStoppableSlopePct: Number(maxStoppableSlopePct.toFixed(3)) },
    },
  };
}

/** A validated read's answer, or the 422 body when the ball cannot stop on that slope at that speed. */
export function answerRead(input: ReadRequest): { ok: true; response: ReadResponse } | { ok: false; error: ApiErrorBody } {
  const result = solveRead(input);
  if (!result.ok) return { ok: false, error: cannotStopBody(result.message, "slopePct", input.stimpFt, result.model.maxStoppableSlopePct) };
  return { ok: true, response: toReadResponse(result.read) };
}

/** A validated chart request's answer: aim offsets over distances × fall-line directions. */
export function answerChart(input: ChartRequest): ChartResponse {
  const result = breakChart({
    slopePct: input.slopePct,
    stimpFt: input.stimpFt,
    pace: input.pace,
    distancesM: input.distances,
    fallLineDegs: input.fallLineDegs,
  });
  return {
    slopePct: input.slopePct,
    stimpFt: input.stimpFt,
    pace: input.pace,
    distances: [...result.distancesM],
    fallLineDegs: [...result.fallLineDegs],
    canStop: result.canStop,
    cells: result.cells,
    model: {
      name: result.model.name,
      maxStoppableSlopePct: result.model.maxStoppableSlopePct,
      rollingDecelMps2: result.model.rollingDecelMps2,
    },
  };
}
