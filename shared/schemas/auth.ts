import { z } from "zod";
import { personNameSchema } from "./text";
import { SIGN_UP_ROLES } from "../roles";

/**
 * The sign-up form. The chosen role travels to better-auth as the `accountType` field
 * (better-auth refuses `role` as input); it can only be player or coach.
 */
export const signUpSchema = z.object({
  name: personNameSchema,
  email: z.string().trim().min(1, "Enter your e-mail address.").pipe(z.email("Enter a valid e-mail address.")),
  password: z.string().min(8, "Use at least 8 characters.").max(128, "Use at most 128 characters."),
  role: z.enum(SIGN_UP_ROLES, { error: "Choose whether you are a player or a coach." }),
});
export type SignUpValues = z.output<typeof signUpSchema>;
