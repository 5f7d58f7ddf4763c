import { expect, test } from "vitest";
import { describeAuthError } from "./auth-errors";

test("describeAuthError reads the server's {error: {code, message, fields}} shape as the better-auth client hands it over", () => {
  // The better-auth client spreads the JSON body into its error, beside status and statusText.
  const taken = {
    status: 422,
    statusText: "Unprocessable",
    error: { code: "user_already_exists_use_another_email", message: "User already exists." },
  };
  expect(describeAuthError(taken)).toEqual({ field: "email", message: expect.stringMatching(/already exists/) });
  const wrong = {
    status: 401,
    statusText: "Unauthorized",
    error: { code: "invalid_email_or_password", message: "Invalid email or password" },
  };
  expect(describeAuthError(wrong).message).toBe("That e-mail and password do not match an account.");
  const named = {
    status: 400,
    statusText: "Bad Request",
    error: { code: "bad_request", message: "The request body is not valid.", fields: { name: "At most 100 characters" } },
  };
  expect(describeAuthError(named)).toEqual({ field: "name", message: "At most 100 characters" });
  const unknown = {
    status: 403,
    statusText: "Forbidden",
    error: { code: "forbidden", message: "Changes are accepted only from Borrowline's own pages." },
  };
  expect(describeAuthError(unknown).message).toBe("Changes are accepted only from Borrowline's own pages.");
});
