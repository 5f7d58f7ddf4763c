import { z } from "zod";
import { SIGN_UP_ROLES } from "../roles";

/**
 * The sign-up form. The chosen role travels to better-auth as the `accountType` field
 * (better-auth refuses `role` as input); it can only be player or coach.
 */
export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(100, "Keep your name under 100 characters."),
  email: z.string().trim().min(1, "Enter your e-mail address.").pipe(z.email("Enter a valid e-mail address.")),
  password: z.string().min(8, "Use at least 8 characters.").max(128, "Use at most 128 characters."),
  role: z.enum(SIGN_UP_ROLES, { error: "Choose whether you are a player or a coach." }),
});
export type SignUpValues = z.output<typeof signUpSchema>;
