import { Router } from "express";
import { csvExportQuerySchema, csvImportFieldsSchema } from "../../../shared/schemas/putts";
import type { AppDeps } from "../../deps";
import { csvUpload } from "../../lib/csv";
import { requireUser } from "../../middleware/session";
import { validateBody, validateQuery } from "../../middleware/validate";
import { exportPutts, exportSessions, importCsv, previewCsv } from "./csv.handlers";

export function csvRoutes({ database }: AppDeps) {
  const db = database.db;
  const router = Router();
  // Sign-in is checked before multer reads the upload.
  router.post("/csv/putts/preview", requireUser, csvUpload, previewCsv(db));
  router.post("/csv/putts/import", requireUser, csvUpload, validateBody(csvImportFieldsSchema), importCsv(db));
  router.get("/csv/putts/export", requireUser, validateQuery(csvExportQuerySchema), exportPutts(db));
  router.get("/csv/sessions/export", requireUser, validateQuery(csvExportQuerySchema), exportSessions(db));
  return router;
}
