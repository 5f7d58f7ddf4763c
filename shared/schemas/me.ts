import { z } from "zod";
import { ROLES } from "../roles";
import { UNIT_SYSTEMS } from "../units";

export const preferencesSchema = z.object({ units: z.enum(UNIT_SYSTEMS) }).strict();
export type Preferences = z.infer<typeof preferencesSchema>;

export const meSchema = z.object({
  user: z.object({
    id: z.string(),
    name: z.string(),
    email: z.string(),
    role: z.enum(ROLES),
    emailVerified: z.boolean(),
    /** When the account was made (ISO); the home page greets an account under a day old as new. */
    createdAt: z.string(),
  }),
  preferences: preferencesSchema,
});
export type Me = z.infer<typeof meSchema>;

/** GET /api/me when nobody is signed in: a 200 that says so (a page asking "who is here?" is not an error). */
export const signedOutMeSchema = z.object({ user: z.null(), preferences: z.null() }).strict();
export type SignedOutMe = z.infer<typeof signedOutMeSchema>;
/** GET /api/me: who is signed in, or nobody. */
export const meResponseSchema = z.union([meSchema, signedOutMeSchema]);
export type MeResponse = z.output<typeof meResponseSchema>;
export type MeUser = Me["user"];
