import { z } from "zod";
import { SIGN_UP_ROLES } from "../roles";

/** What better-auth's sign-up accepts, plus the role a person may choose (never admin). */
export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name").max(100),
  email: z.email("Enter a valid e-mail address").max(254),
  password: z.string().min(8, "At least 8 characters").max(128),
  role: z.enum(SIGN_UP_ROLES, { message: "Choose player or coach" }),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: z.email("Enter a valid e-mail address"),
  password: z.string().min(1, "Enter your password"),
});
