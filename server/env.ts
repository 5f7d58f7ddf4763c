// The only reader of process.env: validated once at start.
import { z } from "zod";

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("production"),
  PORT: z.coerce.number().int().min(0).max(65535).default(5175),
  HOST: z.string().default("0.0.0.0"),
  BASE_URL: z.url().optional(),
  DATA_DIR: z.string().default("./data"),
  DATABASE_URL: z.string().optional(),
  /** PGlite's buffer pool (PostgreSQL's shared_buffers); 32MB keeps a fresh server under 400 MB RSS. */
  PGLITE_SHARED_BUFFERS: z
    .string()
    .regex(/^\d+(kB|MB|GB)$/)
    .default("32MB"),
  /** PostgreSQL cancels a statement that runs longer (the request answers 503). PGlite cannot interrupt one. */
  DB_STATEMENT_TIMEOUT_MS: z.coerce.number().int().min(0).default(10_000),
  SEED: z.enum(["0", "1"]).default("1"),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default("Borrowline <no-reply@borrowline.local>"),
  BETTER_AUTH_SECRET: z.string().min(32).optional(),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  TRUST_PROXY: z.enum(["0", "1"]).default("0"),
});

export type Env = z.infer<typeof envSchema>;

export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  return parsed.data;
}
