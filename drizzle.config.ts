import { defineConfig } from "drizzle-kit";

// Migrations are generated from server/db/schema.ts into drizzle/ and applied at start-up
// (PGlite or, with DATABASE_URL, a PostgreSQL server).
export default defineConfig({
  dialect: "postgresql",
  schema: "./server/db/schema.ts",
  out: "./drizzle",
  ...(process.env.DATABASE_URL
    ? { dbCredentials: { url: process.env.DATABASE_URL } }
    : { driver: "pglite", dbCredentials: { url: "./data/pglite" } }),
});
