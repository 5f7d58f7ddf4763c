import { meResponseSchema, meSchema, preferencesSchema } from "../../../shared/schemas/me";
import type { AppDeps } from "../../deps";
import { defineRoute } from "../../lib/route";
import { requireUser } from "../../middleware/session";
import { getMe, updatePreferences } from "./me.handlers";

export function meRoutes({ database }: AppDeps) {
  return [
    // Open to everyone: signed out it answers { user: null } (no 401 in the console of every signed-out page).
    defineRoute({ method: "get", path: "/me", response: meResponseSchema }, getMe(database.db)),
    defineRoute(
      { method: "patch", path: "/me/preferences", use: [requireUser], body: preferencesSchema, response: meSchema },
      updatePreferences(database.db),
    ),
  ];
}
