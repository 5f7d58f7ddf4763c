import { z } from "zod";

export const idSchema = z.string().uuid();
export const isoDateSchema = z.iso.date();
/** A finite number: JSON cannot carry NaN, but a query string can try. */
export const finite = () => z.number().finite();

/** A moment on the wire: an ISO 8601 string. A handler may hand over a Date (Express writes its toISOString). */
export const timestampSchema = z.union([z.string(), z.date()]).transform((v) => (typeof v === "string" ? v : v.toISOString()));
/** A calendar date on the wire (YYYY-MM-DD). */
export const dateStringSchema = z.string();
/** The answer of a create that returns only the new row's id. */
export const createdIdSchema = z.object({ id: z.string() });
