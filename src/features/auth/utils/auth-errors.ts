// Turns a better-auth client error into a message for the person at the form, and says
// which field it belongs to when it belongs to one.

/**
 * What the better-auth client gives back: our server answers every error as {"error": {"code", "message"}}
 * (better-auth's own codes in lower case), which the client spreads into the error beside status.
 */
export type AuthErrorLike =
  | {
      code?: string;
      message?: string;
      status?: number;
      statusText?: string;
      error?: { code?: string; message?: string; fields?: Record<string, string> };
    }
  | null
  | undefined;
export type AuthField = "name" | "email" | "password" | "newPassword" | "role";
export type DescribedAuthError = { field?: AuthField; message: string };

const byCode: Record<string, DescribedAuthError> = {
  USER_ALREADY_EXISTS: { field: "email", message: "An account with this e-mail already exists. Sign in instead, or use another e-mail." },
  USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: {
    field: "email",
    message: "An account with this e-mail already exists. Sign in instead, or use another e-mail.",
  },
  INVALID_EMAIL: { field: "email", message: "Enter a valid e-mail address." },
  PASSWORD_TOO_SHORT: { field: "password", message: "The password is too short." },
  PASSWORD_TOO_LONG: { field: "password", message: "The password is too long." },
  INVALID_PASSWORD: { field: "password", message: "That password is not right." },
  INVALID_EMAIL_OR_PASSWORD: { message: "That e-mail and password do not match an account." },
  EMAIL_NOT_VERIFIED: { message: "Confirm your e-mail first: open the link we sent you, then sign in." },
  INVALID_TOKEN: { message: "This reset link is not valid any more. Ask for a new one." },
  TOKEN_EXPIRED: { message: "This reset link has expired. Ask for a new one." },
  FIELD_NOT_ALLOWED: { message: "The server did not accept one of the details sent." },
};

const FIELDS: readonly AuthField[] = ["name", "email", "password", "newPassword"];

export function describeAuthError(error: AuthErrorLike, fallback = "Something went wrong. Please try again."): DescribedAuthError {
  if (!error) return { message: fallback };
  if (error.status === 429) return { message: "Too many attempts. Wait a minute and try again." };
  const inner = error.error && typeof error.error === "object" ? error.error : undefined;
  const code = (inner?.code ?? error.code)?.toUpperCase();
  const message = inner?.message ?? error.message;
  const known = code ? byCode[code] : undefined;
  if (known) return known;
  // A 400 from our guard names the field: show the reason beside it.
  const named = Object.entries(inner?.fields ?? {}).find(([k]) => (FIELDS as readonly string[]).includes(k));
  if (named) return { field: named[0] as AuthField, message: named[1] };
  if (error.status === 0 || error.status === undefined) {
    return { message: message || "Could not reach Borrowline. Check your connection and try again." };
  }
  return { message: message || fallback };
}
