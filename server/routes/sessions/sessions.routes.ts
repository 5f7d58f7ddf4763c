import { createdIdSchema } from "../../../shared/schemas/common";
import {
  sessionInputSchema,
  sessionItemSchema,
  sessionListQuerySchema,
  sessionPageSchema,
  sessionPatchSchema,
} from "../../../shared/schemas/sessions";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { createSession, deleteSession, getSession, listSessions, updateSession } from "./sessions.handlers";

const user = [requireUser];

export function sessionsRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute(
      { method: "get", path: "/sessions", use: user, query: sessionListQuerySchema, response: sessionPageSchema },
      listSessions(db),
    ),
    defineRoute(
      { method: "post", path: "/sessions", use: user, body: sessionInputSchema, response: createdIdSchema, status: 201 },
      createSession(db),
    ),
    defineRoute({ method: "get", path: "/sessions/:id", use: user, response: sessionItemSchema }, getSession(db)),
    defineRoute(
      { method: "patch", path: "/sessions/:id", use: user, body: sessionPatchSchema, response: sessionItemSchema },
      updateSession(db),
    ),
    defineRoute({ method: "delete", path: "/sessions/:id", use: user, response: noContent }, deleteSession(db)),
  ];
}
