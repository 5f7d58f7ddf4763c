import { sql } from "drizzle-orm";
import { healthSchema } from "../../../shared/schemas/system";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";

export function healthRoutes({ database }: AppDeps) {
  return [
    defineRoute({ method: "get", path: "/health", response: healthSchema }, async () => {
      await database.db.execute(sql`select 1`);
      return { ok: true as const, db: database.kind };
    }),
  ];
}
