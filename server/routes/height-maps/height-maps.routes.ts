import { Router, type RequestHandler } from "express";
import { surfaceSolveSchema } from "../../../shared/schemas/height-map";
import type { AppDeps } from "../../deps";
import { csvUpload } from "../../lib/csv";
import { limiter } from "../../middleware/rate-limit";
import { requireUser } from "../../middleware/session";
import { validateBody } from "../../middleware/validate";
import { deleteHeightMap, getHeightMap, putHeightMap, requireOwnGreen, solveOnSurface } from "./height-maps.handlers";

/** multer only for a multipart upload; a JSON body is already parsed by express.json. */
const csvIfMultipart: RequestHandler = (req, res, next) => (req.is("multipart/form-data") ? csvUpload(req, res, next) : next());

/** A green's height map (owner writes; owner and the squad it is shared with read) and reads solved on its surface. */
export function heightMapRoutes({ database, config }: AppDeps) {
  const db = database.db;
  const router = Router();
  const readLimit = limiter(config.rateLimits.reads, "read");
  // Ownership is checked before multer reads the upload.
  router.put("/greens/:id/height-map", requireUser, requireOwnGreen(db), csvIfMultipart, putHeightMap(db));
  router.get("/greens/:id/height-map", requireUser, getHeightMap(db));
  router.delete("/greens/:id/height-map", requireUser, requireOwnGreen(db), deleteHeightMap(db));
  router.post("/greens/:id/reads/solve", requireUser, readLimit, validateBody(surfaceSolveSchema), solveOnSurface(db));
  return router;
}
