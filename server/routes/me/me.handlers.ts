import type { RequestHandler } from "express";
import { eq } from "drizzle-orm";
import { preferencesSchema, type Me, type SignedOutMe } from "../../../shared/schemas/me";
import type { Db } from "../../db/client";
import { user as userTable, userPreferences } from "../../db/schema";
import { currentUser, type SessionUser } from "../../middleware/session";
import { body } from "../../middleware/validate";

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

export function getMe(db: Db): RequestHandler {
  return async (req, res) => {
    if (!req.user) {
      const nobody: SignedOutMe = { user: null, preferences: null };
      res.json(nobody);
      return;
    }
    res.json(await meOf(db, req.user));
  };
}

export function updatePreferences(db: Db): RequestHandler {
  return async (req, res) => {
    const user = currentUser(req);
    const { units } = body(req, preferencesSchema);
    await db
      .insert(userPreferences)
      .values({ userId: user.id, units })
      .onConflictDoUpdate({ target: userPreferences.userId, set: { units, updatedAt: new Date() } });
    res.json(await meOf(db, user));
  };
}
