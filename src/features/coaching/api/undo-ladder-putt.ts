import type { AssignmentDetail } from "#shared/schemas/assignments";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";

/** DELETE /api/assignments/:id/putts/last → the state without the latest putt (404 when there is none). */
export function undoLadderPutt(assignmentId: string): Promise<AssignmentDetail> {
  return api.delete<AssignmentDetail>(apiPaths.assignmentLastPutt(assignmentId));
}
