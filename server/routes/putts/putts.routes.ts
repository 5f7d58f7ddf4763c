import { createdIdSchema } from "../../../shared/schemas/common";
import { puttInputSchema, puttListQuerySchema, puttListSchema, puttPageSchema, puttSchema } from "../../../shared/schemas/putts";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { puttWriter } from "../../db/putt-writer";
import { addPutt, deletePutt, getPutt, listPutts, listSessionPutts } from "./putts.handlers";

const user = [requireUser];

export function puttsRoutes({ database }: AppDeps) {
  const db = database.db;
  // One writer per app: putts posted while a group is being written go together in the next one.
  const writer = puttWriter(db);
  return [
    defineRoute(
      { method: "post", path: "/sessions/:id/putts", use: user, body: puttInputSchema, response: createdIdSchema, status: 201 },
      addPutt(db, writer),
    ),
    defineRoute({ method: "get", path: "/sessions/:id/putts", use: user, response: puttListSchema }, listSessionPutts(db)),
    defineRoute({ method: "get", path: "/putts", use: user, query: puttListQuerySchema, response: puttPageSchema }, listPutts(db)),
    defineRoute({ method: "get", path: "/putts/:id", use: user, response: puttSchema }, getPutt(db)),
    defineRoute({ method: "delete", path: "/putts/:id", use: user, response: noContent }, deletePutt(db)),
  ];
}
