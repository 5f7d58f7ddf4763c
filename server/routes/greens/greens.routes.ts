import {
  greenInputSchema,
  greenListSchema,
  greenPatchSchema,
  greenSchema,
  greenShareSchema,
  stimpReadingInputSchema,
} from "../../../shared/schemas/greens";
import type { AppDeps } from "../../deps";
import { defineRoute, noContent } from "../../lib/route";
import { requireRole, requireUser } from "../../middleware/session";
import {
  addStimpReading,
  createGreen,
  deleteGreen,
  deleteStimpReading,
  getGreen,
  listGreens,
  shareGreen,
  updateGreen,
} from "./greens.handlers";

const user = [requireUser];

export function greensRoutes({ database }: AppDeps) {
  const db = database.db;
  return [
    defineRoute({ method: "get", path: "/greens", use: user, response: greenListSchema }, listGreens(db)),
    defineRoute(
      { method: "post", path: "/greens", use: user, body: greenInputSchema, response: greenSchema, status: 201 },
      createGreen(db),
    ),
    defineRoute({ method: "get", path: "/greens/:id", use: user, response: greenSchema }, getGreen(db)),
    defineRoute({ method: "patch", path: "/greens/:id", use: user, body: greenPatchSchema, response: greenSchema }, updateGreen(db)),
    defineRoute({ method: "delete", path: "/greens/:id", use: user, response: noContent }, deleteGreen(db)),
    // Only a coach has squads to share with (an admin too, for their own greens and squads).
    defineRoute(
      { method: "put", path: "/greens/:id/squad", use: [requireRole("coach", "admin")], body: greenShareSchema, response: greenSchema },
      shareGreen(db),
    ),
    defineRoute(
      { method: "post", path: "/greens/:id/stimp-readings", use: user, body: stimpReadingInputSchema, response: greenSchema, status: 201 },
      addStimpReading(db),
    ),
    defineRoute(
      { method: "delete", path: "/greens/:id/stimp-readings/:readingId", use: user, response: noContent },
      deleteStimpReading(db),
    ),
  ];
}
