// Imported first by main.tsx, before any schema is built: zod compiles a fast path for each object schema with
// `new Function` unless told not to, which the Content-Security-Policy (no 'unsafe-eval') refuses and reports.
// Set before the first z.object(): zod reads the flag when a schema is made.
import { z } from "zod";

z.config({ jitless: true });
