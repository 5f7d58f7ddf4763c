import { ladderCopySchema, ladderInputSchema, ladderListSchema, ladderSchema } from "../../../shared/schemas/ladders";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireRole } from "../../middleware/session";
import { copyLadder, createLadder, deleteLadder, getLadder, listLadders, updateLadder } from "./ladders.handlers";

const coach = [requireRole("coach", "admin")];

export function ladderRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute(
      { method: "post", path: "/ladders", use: coach, body: ladderInputSchema, response: ladderSchema, status: 201 },
      createLadder(db),
    ),
    defineRoute({ method: "get", path: "/ladders", use: coach, response: ladderListSchema }, listLadders(db)),
    defineRoute({ method: "get", path: "/ladders/:id", use: coach, response: ladderSchema }, getLadder(db)),
    defineRoute({ method: "put", path: "/ladders/:id", use: coach, body: ladderInputSchema, response: ladderSchema }, updateLadder(db)),
    defineRoute({ method: "delete", path: "/ladders/:id", use: coach, response: noContent }, deleteLadder(db)),
    defineRoute(
      { method: "post", path: "/ladders/:id/copy", use: coach, body: ladderCopySchema, response: ladderSchema, status: 201 },
      copyLadder(db),
    ),
  ];
}
