import { eq } from "drizzle-orm";
import { user } from "../../server/db/schema";
import type { TestServer } from "../setup/server";
import { HttpClient } from "../setup/http";

let counter = 0;
export const TEST_PASSWORD = "correct-horse-battery";

export function uniqueEmail(prefix = "user"): string {
  counter += 1;
  return `${prefix}-${counter}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

/** Signs up through the real API and returns a signed-in client. */
export async function signedUpClient(server: TestServer, accountType: "player" | "coach" = "player", name = "Test Golfer") {
  const client = new HttpClient(server.url);
  const email = uniqueEmail(accountType);
  const res = await client.post("/api/auth/sign-up/email", { name, email, password: TEST_PASSWORD, accountType });
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { client, email, id: res.body.user.id as string };
}

/** An admin cannot be made through the API: tests promote directly in the database, as the CLI does. */
export async function adminClient(server: TestServer) {
  const made = await signedUpClient(server, "player", "Test Admin");
  await server.database.db.update(user).set({ role: "admin" }).where(eq(user.email, made.email));
  // Sign in afresh: the session cookie carries a cached copy of the user (role included) for a minute.
  const client = new HttpClient(server.url);
  const res = await client.post("/api/auth/sign-in/email", { email: made.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`admin sign-in failed: ${res.status}`);
  return { ...made, client };
}
