// The read and the chart worked out in the browser, with the same physics and in the same shape as the server's
// answer: used when the server cannot be reached (no signal on the course), loaded only then.
import type { z } from "zod";
import { answerChart, answerRead } from "#shared/read-answers";
import {
  chartRequestSchema,
  readRequestSchema,
  type ChartRequest,
  type ChartResponse,
  type ReadRequest,
  type ReadResponse,
} from "#shared/schemas/reads";
import { toApiError } from "../../../lib/api-client";

/** The server's 400 for input it would refuse, so the page explains it the same way offline. */
function refused(error: z.ZodError): Error {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) fields[issue.path.join(".") || "body"] ??= issue.message;
  return toApiError(400, { error: { code: "bad_request", message: "The request body is not valid.", fields } });
}

export function readOffline(input: ReadRequest): ReadResponse {
  const parsed = readRequestSchema.safeParse(input);
  if (!parsed.success) throw refused(parsed.error);
  const answer = answerRead(parsed.data);
  if (!answer.ok) throw toApiError(422, answer.error);
  return answer.response;
}

export function chartOffline(input: ChartRequest): ChartResponse {
  const parsed = chartRequestSchema.safeParse(input);
  if (!parsed.success) throw refused(parsed.error);
  return answerChart(parsed.data);
}
