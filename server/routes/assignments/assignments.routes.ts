import {
  assignInputSchema,
  assignmentDetailSchema,
  assignmentListSchema,
  ladderPuttInputSchema,
} from "../../../shared/schemas/assignments";
import type { RouterDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import { addLadderPutt, createAssignments, getAssignment, listMyAssignments, undoLastLadderPutt } from "./assignments.handlers";

export function assignmentRoutes(deps: RouterDeps) {
  const db = deps.database.db;
  return [
    defineRoute(
      {
        method: "post",
        path: "/ladders/:id/assignments",
        use: [requireRole("coach", "admin")],
        body: assignInputSchema,
        after: [deps.mail.byAccount],
        response: assignmentListSchema,
        status: 201,
      },
      createAssignments(deps),
    ),
    defineRoute({ method: "get", path: "/assignments", use: [requireUser], response: assignmentListSchema }, listMyAssignments(db)),
    defineRoute({ method: "get", path: "/assignments/:id", use: [requireUser], response: assignmentDetailSchema }, getAssignment(db)),
    defineRoute(
      { method: "post", path: "/assignments/:id/putts", use: [requireUser], body: ladderPuttInputSchema, response: assignmentDetailSchema },
      addLadderPutt(db),
    ),
    defineRoute(
      { method: "delete", path: "/assignments/:id/putts/last", use: [requireUser], response: assignmentDetailSchema },
      undoLastLadderPutt(db),
    ),
  ];
}
