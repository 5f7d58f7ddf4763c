import { csvExportQuerySchema, csvImportFieldsSchema, csvImportResponseSchema, csvPreviewSchema } from "../../../shared/schemas/putts";
import { DEFAULT_RATE_LIMITS, type AppDeps } from "../../deps";
import { csvUpload } from "../../lib/csv";
import { csvFile, defineRoute } from "../../lib/route";
import { limiter } from "../../middleware/rate-limit";
import { currentUser, requireUser } from "../../middleware/session";
import { exportPutts, exportSessions } from "./csv-export.handlers";
import { importCsv, previewCsv } from "./csv-import.handlers";

export function csvRoutes({ database, config, logger }: AppDeps) {
  const db = database.db;
  // Per signed-in user: an import is heavy work for the one database connection PGlite has.
  const importLimit = limiter(config.rateLimits.imports ?? DEFAULT_RATE_LIMITS.imports!, "import", (req) => currentUser(req).id);
  return [
    // Sign-in is checked before multer reads the upload.
    defineRoute({ method: "post", path: "/csv/putts/preview", use: [requireUser, csvUpload], response: csvPreviewSchema }, previewCsv(db)),
    defineRoute(
      {
        method: "post",
        path: "/csv/putts/import",
        use: [requireUser, importLimit, csvUpload],
        body: csvImportFieldsSchema,
        response: csvImportResponseSchema,
      },
      importCsv(db, logger),
    ),
    defineRoute(
      { method: "get", path: "/csv/putts/export", use: [requireUser], query: csvExportQuerySchema, response: csvFile },
      exportPutts(db),
    ),
    defineRoute(
      { method: "get", path: "/csv/sessions/export", use: [requireUser], query: csvExportQuerySchema, response: csvFile },
      exportSessions(db),
    ),
  ];
}
