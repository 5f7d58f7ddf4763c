import { z } from "zod";

export const idSchema = z.string().uuid();
export const isoDateSchema = z.iso.date();
/** A finite number: JSON cannot carry NaN, but a query string can try. */
export const finite = () => z.number().finite();
