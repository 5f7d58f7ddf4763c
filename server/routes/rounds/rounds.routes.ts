import { holeBodySchema, roundInputSchema, roundListQuerySchema, roundPageSchema, roundSchema } from "../../../shared/schemas/rounds";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { createRound, deleteRound, getRound, listRounds, putHole } from "./rounds.handlers";

const user = [requireUser];

export function roundsRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute({ method: "get", path: "/rounds", use: user, query: roundListQuerySchema, response: roundPageSchema }, listRounds(db)),
    defineRoute(
      { method: "post", path: "/rounds", use: user, body: roundInputSchema, response: roundSchema, status: 201 },
      createRound(db),
    ),
    defineRoute({ method: "get", path: "/rounds/:id", use: user, response: roundSchema }, getRound(db)),
    defineRoute({ method: "delete", path: "/rounds/:id", use: user, response: noContent }, deleteRound(db)),
    defineRoute({ method: "put", path: "/rounds/:id/holes/:n", use: user, body: holeBodySchema, response: roundSchema }, putHole(db)),
  ];
}
