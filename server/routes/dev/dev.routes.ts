import { devMailListSchema } from "../../../shared/schemas/system";
import type { AppDeps } from "../../deps";
import { readInbox } from "../../lib/dev-inbox";
import { defineRoute } from "../../lib/route";
import { requireRole } from "../../middleware/session";

/**
 * The local SMTP fake's mailbox (no SMTP_URL set): every e-mail the servers on this database sent, reset links
 * included, so only a signed-in admin may read it, in every mode. Read from the database (lib/dev-inbox.ts), so
 * every server shows the same mailbox.
 */
export function devRoutes({ database }: AppDeps) {
  return [
    defineRoute({ method: "get", path: "/dev/mail", use: [requireRole("admin")], response: devMailListSchema }, async () => ({
      messages: await readInbox(database.db),
    })),
  ];
}
