import { createAuthClient } from "better-auth/react";
import { adminClient } from "better-auth/client/plugins";

// Same origin, default basePath /api/auth.
export const authClient = createAuthClient({
  plugins: [adminClient()],
});

export type AuthClient = typeof authClient;
