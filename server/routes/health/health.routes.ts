import { Router } from "express";
import { sql } from "drizzle-orm";
import type { AppDeps } from "../../deps";

export function healthRoutes({ database }: AppDeps) {
  const router = Router();
  router.get("/health", async (_req, res) => {
    await database.db.execute(sql`select 1`);
    res.json({ ok: true, db: database.kind });
  });
  return router;
}
