/** The one error body every API route answers with. */
export type ApiErrorBody = {
  error: {
    code: string;
    message: string;
    /** Field path (dot-separated) → why it was refused. */
    fields?: Record<string, string>;
    /** Machine-readable facts beside the message, e.g. `{ reason: "cannot-stop", maxStoppableSlopePct: 7.86 }`. */
    details?: Record<string, number | string>;
  };
};

/**
 * The steepest stoppable slope (%) a "cannot stop" 422 carries in `error.details`, or undefined for any other
 * answer. Clients read the number, never the English message.
 */
export function maxStoppableSlopeOf(body: unknown): number | undefined {
  const details = (body as Partial<ApiErrorBody> | null | undefined)?.error?.details;
  const value = details?.reason === "cannot-stop" ? details.maxStoppableSlopePct : undefined;
  return typeof value === "number" && Number.isFinite(value) ? value : undefined;
}

export const ERROR_CODES = {
  badRequest: "bad_request",
  unauthenticated: "unauthenticated",
  forbidden: "forbidden",
  notFound: "not_found",
  conflict: "conflict",
  tooLarge: "payload_too_large",
  unsupportedMedia: "unsupported_media_type",
  unprocessable: "unprocessable",
  tooManyRequests: "too_many_requests",
  unavailable: "unavailable",
  timeout: "timeout",
  internal: "internal",
} as const;

export type ErrorCode = (typeof ERROR_CODES)[keyof typeof ERROR_CODES];
