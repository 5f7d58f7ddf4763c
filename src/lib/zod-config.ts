// Imported first by main.tsx, before any schema is built: zod compiles a fast path for each object schema with
// `new Function` unless told not to, which the Content-Security-Policy (no 'unsafe-eval') refuses and reports.
// Set before the first z.object(): zod reads the flag when a schema is made. The named import keeps zod itself out
// of the entry chunk (`import { z }` would pull the whole namespace into every page).
import { config } from "zod";

config({ jitless: true });
