import { z } from "zod";
import { timestampSchema } from "./common";

/** GET /api/health. */
export const healthSchema = z.object({ ok: z.literal(true), db: z.enum(["pglite", "postgres"]) });
export type Health = z.output<typeof healthSchema>;

/** One e-mail the local SMTP fake held (GET /api/dev/mail, an admin's only). */
export const devMailMessageSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  receivedAt: timestampSchema,
});
export type DevMailMessage = z.output<typeof devMailMessageSchema>;
export const devMailListSchema = z.object({ messages: z.array(devMailMessageSchema) });
export type DevMailList = z.output<typeof devMailListSchema>;
