import type { AssignmentDetail, LadderPuttInput } from "../../../../shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";

/**
 * POST /api/assignments/:id/putts → the new state (201; 200 when the clientId was already stored, so a retry
 * is safe). The run page queues putts itself (see hooks/use-ladder-run.ts), so there is no mutation hook here.
 */
export function addLadderPutt(assignmentId: string, input: LadderPuttInput): Promise<AssignmentDetail> {
  return api.post<AssignmentDetail>(apiPaths.assignmentPutts(assignmentId), input);
}
