import { squadInputSchema, squadListSchema, squadPatchSchema, squadSchema } from "../../../shared/schemas/squads";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import { createSquad, deleteSquad, getSquad, leaveSquad, listSquads, removeMember, updateSquad } from "./squads.handlers";

const coach = [requireRole("coach", "admin")];

export function squadRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute(
      { method: "post", path: "/squads", use: coach, body: squadInputSchema, response: squadSchema, status: 201 },
      createSquad(db),
    ),
    defineRoute({ method: "get", path: "/squads", use: [requireUser], response: squadListSchema }, listSquads(db)),
    defineRoute({ method: "get", path: "/squads/:id", use: coach, response: squadSchema }, getSquad(db)),
    defineRoute({ method: "patch", path: "/squads/:id", use: coach, body: squadPatchSchema, response: squadSchema }, updateSquad(db)),
    defineRoute({ method: "delete", path: "/squads/:id", use: coach, response: noContent }, deleteSquad(db)),
    defineRoute({ method: "delete", path: "/squads/:id/members/:playerId", use: coach, response: noContent }, removeMember(db)),
    defineRoute({ method: "post", path: "/squads/:id/leave", use: [requireUser], response: noContent }, leaveSquad(db)),
  ];
}
