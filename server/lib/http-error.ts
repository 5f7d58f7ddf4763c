import { ERROR_CODES, type ApiErrorBody, type ErrorCode } from "../../shared/errors";
import { cannotStopBody } from "../../shared/read-answers";

/** Thrown anywhere in a handler; the error middleware writes the JSON body once. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    /** Machine-readable facts beside the message (numbers a client can show), e.g. a cannot-stop slope limit. */
    readonly details?: Record<string, number | string>,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) => new HttpError(400, ERROR_CODES.badRequest, message, fields);
export const unauthenticated = () => new HttpError(401, ERROR_CODES.unauthenticated, "Sign in to do this.");
export const forbidden = (message = "Your role does not allow this.") => new HttpError(403, ERROR_CODES.forbidden, message);
export const notFound = (what = "That") => new HttpError(404, ERROR_CODES.notFound, `${what} was not found.`);
export const conflict = (message: string) => new HttpError(409, ERROR_CODES.conflict, message);
export const unprocessable = (message: string, fields?: Record<string, string>) =>
  new HttpError(422, ERROR_CODES.unprocessable, message, fields);

/**
 * The 422 of a ball that cannot stop, the same for the planar and the surface read: the physics message, the field
 * to change, and `details.reason: "cannot-stop"` with the steepest stoppable slope (%) as a number
 * (`cannotStopBody` in shared/read-answers.ts, which the browser uses offline too).
 */
export const cannotStopError = (message: string, field: string, stimpFt: number, maxStoppableSlopePct: number) =>
  httpErrorOf(422, cannotStopBody(message, field, stimpFt, maxStoppableSlopePct));

/** An HttpError carrying an error body built elsewhere (shared code that builds the same body for the browser). */
export function httpErrorOf(status: number, body: ApiErrorBody): HttpError {
  const { code, message, fields, details } = body.error;
  return new HttpError(status, code as ErrorCode, message, fields, details);
}
