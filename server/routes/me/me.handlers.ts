import { eq } from "drizzle-orm";
import type { Me, Preferences, SignedOutMe } from "../../../shared/schemas/me";
import type { Db } from "../../db/client";
import { user as userTable, userPreferences } from "../../db/schema";
import { currentUser, type SessionUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

async function meOf(db: Db, user: SessionUser): Promise<Me> {
  const [[prefs], [row]] = await Promise.all([
    db.select().from(userPreferences).where(eq(userPreferences.userId, user.id)),
    // Read afresh: the session's cached copy may predate a confirmation (e.g. by an invitation link).
    db.select({ createdAt: userTable.createdAt, emailVerified: userTable.emailVerified }).from(userTable).where(eq(userTable.id, user.id)),
  ]);
  return {
    user: { ...user, emailVerified: row?.emailVerified ?? user.emailVerified, createdAt: (row?.createdAt ?? new Date()).toISOString() },
    preferences: { units: prefs?.units === "metric" ? "metric" : "imperial" },
  };
}

export function getMe(db: Db) {
  return async ({ req }: Ctx): Promise<Me | SignedOutMe> => (req.user ? meOf(db, req.user) : { user: null, preferences: null });
}

export function updatePreferences(db: Db) {
  return async ({ req, body: { units } }: Ctx<Preferences>): Promise<Me> => {
    const user = currentUser(req);
    await db
      .insert(userPreferences)
      .values({ userId: user.id, units })
      .onConflictDoUpdate({ target: userPreferences.userId, set: { units, updatedAt: new Date() } });
    return meOf(db, user);
  };
}
