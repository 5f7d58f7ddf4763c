// Turns a better-auth client error into a message for the person at the form, and says
// which field it belongs to when it belongs to one.

export type AuthErrorLike = { code?: string; message?: string; status?: number; statusText?: string } | null | undefined;
export type AuthField = "name" | "email" | "password" | "newPassword" | "role";
export type DescribedAuthError = { field?: AuthField; message: string };

const byCode: Record<string, DescribedAuthError> = {
  USER_ALREADY_EXISTS: { field: "email", message: "An account with this e-mail already exists. Sign in instead, or use another e-mail." },
  USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: { field: "email", message: "An account with this e-mail already exists. Sign in instead, or use another e-mail." },
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

export function describeAuthError(error: AuthErrorLike, fallback = "Something went wrong. Please try again."): DescribedAuthError {
  if (!error) return { message: fallback };
  if (error.status === 429) return { message: "Too many attempts. Wait a minute and try again." };
  const known = error.code ? byCode[error.code] : undefined;
  if (known) return known;
  if (error.status === 0 || error.status === undefined) {
    return { message: error.message || "Could not reach Borrowline. Check your connection and try again." };
  }
  return { message: error.message || fallback };
}
