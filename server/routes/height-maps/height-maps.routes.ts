import type { RequestHandler } from "express";
import {
  heightMapResponseSchema,
  heightMapSummarySchema,
  surfaceReadResponseSchema,
  surfaceSolveSchema,
} from "../../../shared/schemas/height-map";
import type { AppDeps } from "../../deps";
import { csvUpload } from "../../lib/csv";
import { defineRoute, noContent } from "../../lib/route";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { deleteHeightMap, getHeightMap, putHeightMap, requireOwnGreen, solveOnSurface } from "./height-maps.handlers";

/** multer only for a multipart upload; a JSON body is already parsed by express.json. */
const csvIfMultipart: RequestHandler = (req, res, next) => (req.is("multipart/form-data") ? csvUpload(req, res, next) : next());

/** A green's height map (owner writes; owner and the squad it is shared with read) and reads solved on its surface. */
export function heightMapRoutes({ database, config }: AppDeps) {
  const db = database.db;
  const readLimit = limiter(config.rateLimits.reads, "read");
  return [
    // Ownership is checked before multer reads the upload; the body (CSV form or JSON) is parsed by the handler.
    defineRoute(
      {
        method: "put",
        path: "/greens/:id/height-map",
        use: [requireUser, requireOwnGreen(db), csvIfMultipart],
        response: heightMapSummarySchema,
      },
      putHeightMap(db),
    ),
    defineRoute({ method: "get", path: "/greens/:id/height-map", use: [requireUser], response: heightMapResponseSchema }, getHeightMap(db)),
    defineRoute(
      { method: "delete", path: "/greens/:id/height-map", use: [requireUser, requireOwnGreen(db)], response: noContent },
      deleteHeightMap(db),
    ),
    defineRoute(
      {
        method: "post",
        path: "/greens/:id/reads/solve",
        use: [requireUser, readLimit],
        body: surfaceSolveSchema,
        response: surfaceReadResponseSchema,
      },
      solveOnSurface(db),
    ),
  ];
}
