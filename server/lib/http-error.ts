import { ERROR_CODES, type ErrorCode } from "../../shared/errors";

/** Thrown anywhere in a handler; the error middleware writes the JSON body once. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, ERROR_CODES.badRequest, message, fields);
export const unauthenticated = () => new HttpError(401, ERROR_CODES.unauthenticated, "Sign in to do this.");
export const forbidden = (message = "Your role does not allow this.") => new HttpError(403, ERROR_CODES.forbidden, message);
export const notFound = (what = "That") => new HttpError(404, ERROR_CODES.notFound, `${what} was not found.`);
export const conflict = (message: string) => new HttpError(409, ERROR_CODES.conflict, message);
export const unprocessable = (message: string, fields?: Record<string, string>) =>
  new HttpError(422, ERROR_CODES.unprocessable, message, fields);
