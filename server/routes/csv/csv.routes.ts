import { Router } from "express";
import { csvExportQuerySchema, csvImportFieldsSchema } from "../../../shared/schemas/putts";
import { DEFAULT_RATE_LIMITS, type AppDeps } from "../../deps";
import { csvUpload } from "../../lib/csv";
import { limiter } from "../../middleware/rate-limit";
import { currentUser, requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { exportPutts, exportSessions, importCsv, previewCsv } from "./csv.handlers";

export function csvRoutes({ database, config, logger }: AppDeps) {
  const db = database.db;
  const router = Router();
  // Per signed-in user: an import is heavy work for the one database connection PGlite has.
  const importLimit = limiter(config.rateLimits.imports ?? DEFAULT_RATE_LIMITS.imports!, "import", (req) => currentUser(req).id);
  // Sign-in is checked before multer reads the upload.
  router.post("/csv/putts/preview", requireUser, csvUpload, previewCsv(db));
  router.post("/csv/putts/import", requireUser, importLimit, csvUpload, validateBody(csvImportFieldsSchema), importCsv(db, logger));
  router.get("/csv/putts/export", requireUser, validateQuery(csvExportQuerySchema), exportPutts(db));
  router.get("/csv/sessions/export", requireUser, validateQuery(csvExportQuerySchema), exportSessions(db));
  return router;
}
