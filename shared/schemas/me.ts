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
