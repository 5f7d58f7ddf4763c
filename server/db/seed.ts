// Seeds the demo scenario once (idempotent: skipped when the demo coach exists).
import { eq } from "drizzle-orm";
import { create, all } from "mathjs";
import crypto from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import type { Logger } from "../lib/logger";
import type { Db } from "./client";
import { account, greens, ladders, practiceSessions, putts, squadMembers, squads, stimpReadings, user } from "./schema";
import { seedCoaching } from "./seed-coaching";
import { DEMO_ADMIN, DEMO_COACH, DEMO_GREEN, DEMO_LADDERS, DEMO_PASSWORD, DEMO_PLAYERS, DEMO_SQUAD } from "./seed-data";

const FT = 0.3048;
const WEEKS = 6;

/**
 * Creates a verified account directly (no sign-up e-mail), with better-auth's own password hashing,
 * in the rows its e-mail/password sign-in reads. Used by the seed and the create-admin command.
 */
export async function createAccount(
  db: Db,
  who: { name: string; email: string },
  role: "player" | "coach" | "admin",
  password = DEMO_PASSWORD,
  /** When the account was made (the seed backdates its people to before their first session); default now. */
  createdAt?: Date,
): Promise<string> {
  const id = crypto.randomUUID();
  await db.insert(user).values({
    id,
    name: who.name,
    email: who.email.toLowerCase(),
    emailVerified: true,
    role,
    accountType: role === "coach" ? "coach" : "player",
    ...(createdAt ? { createdAt, updatedAt: createdAt } : {}),
  });
  await db.insert(account).values({ id: crypto.randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(password) });
  return id;
}

function isoDaysAgo(days: number, today = new Date()): string {
  const d = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate() - days));
  return d.toISOString().slice(0, 10);
}

export async function seedDemo(db: Db, logger: Logger): Promise<void> {
  const existing = await db.select({ id: user.id }).from(user).where(eq(user.email, DEMO_COACH.email));
  if (existing.length > 0) return;
  logger.info("seeding the demo scenario (Larkspur Heath)");

  // Reproducible invented data: a seeded generator from mathjs.
  const math = create(all!, { randomSeed: "larkspur-heath" });
  const rand = () => math.random();

  // Sign-up dates tell the story: the admin set the club up, the coach joined, then each junior signed up
  // and joined the squad a few days before their first logged session (player i's first is 40 + i days ago).
  const at = (daysAgo: number, hourUtc: number) => new Date(Date.parse(`${isoDaysAgo(daysAgo)}T00:00:00Z`) + hourUtc * 3_600_000);
  const firstSessionDaysAgo = (i: number) => (WEEKS - 1) * 7 + 5 + i;
  await createAccount(db, DEMO_ADMIN, "admin", DEMO_PASSWORD, at(WEEKS * 7 + 30, 10));
  const coachId = await createAccount(db, DEMO_COACH, "coach", DEMO_PASSWORD, at(WEEKS * 7 + 21, 17));
  const playerIds: string[] = [];
  for (const [i, p] of DEMO_PLAYERS.entries()) playerIds.push(await createAccount(db, p, "player", DEMO_PASSWORD, at(firstSessionDaysAgo(i) + 4 + i, 18)));

  const [green] = await db.insert(greens).values({ ownerId: coachId, name: DEMO_GREEN.name, locationNote: DEMO_GREEN.locationNote }).returning();
  await db.insert(stimpReadings).values([
    { greenId: green!.id, measuredOn: isoDaysAgo(WEEKS * 7), stimpFt: 9.0, note: "After rain, slower" },
    { greenId: green!.id, measuredOn: isoDaysAgo(7), stimpFt: DEMO_GREEN.stimpFt },
  ]);

  const [squad] = await db.insert(squads).values({ coachId, ...DEMO_SQUAD, createdAt: at(WEEKS * 7 + 20, 9) }).returning();
  await db.insert(squadMembers).values(playerIds.map((playerId, i) => ({ squadId: squad!.id, playerId, joinedAt: at(firstSessionDaysAgo(i) + 2, 19) })));
  await db.insert(ladders).values(DEMO_LADDERS.map((l) => ({ ownerId: coachId, ...l, createdAt: at(WEEKS * 7 + 19, 20), updatedAt: at(WEEKS * 7 + 19, 20) })));

  const distancesFt = [3, 3, 4, 4, 5, 5, 6, 6, 8, 8, 10, 12, 15, 20, 25, 30];
  for (const [i, p] of DEMO_PLAYERS.entries()) {
    const playerId = playerIds[i]!;
    for (let week = 0; week < WEEKS; week++) {
      for (const dayOffset of [1, 4]) {
        const daysAgo = (WEEKS - 1 - week) * 7 + (6 - dayOffset) + i;
        const [session] = await db
          .insert(practiceSessions)
          .values({
            playerId,
            date: isoDaysAgo(daysAgo),
            greenId: green!.id,
            stimpFt: week < 2 ? 9.0 : DEMO_GREEN.stimpFt,
            conditions: week < 2 ? "Damp, slow after rain" : "Dry and true",
            tags: week < 2 ? ["damp"] : ["dry"],
          })
          .returning();
        const halfAt = p.halfAtFt + p.gainFtPerWeek * week;
        const rows = [];
        for (let k = 0; k < 24; k++) {
          const ft = distancesFt[Math.floor(rand() * distancesFt.length)]!;
          const made = rand() < 1 / (1 + Math.exp((ft - halfAt) / 2.4));
          const long = ft >= 15;
          // A lag's leave grows with its length (about ±40 % of it at first, tightening each week), so
          // three-putt range (> 1 m) is a real share of the long putts and falls as the juniors improve.
          const lagSpread = ft * FT * (0.4 - 0.03 * week);
          const pastM = long ? (rand() - 0.35) * lagSpread : 0.1 + rand() * 0.5 * (rand() < 0.3 ? -1 : 1);
          rows.push({
            sessionId: session!.id,
            playerId,
            distanceM: ft * FT,
            holed: made,
            missSide: made ? null : rand() < 0.55 ? "right" : "left",
            missLengthM: made ? null : Math.round(pastM * 100) / 100,
            breakType: ["uphill", "downhill", "left-to-right", "right-to-left", "straight"][Math.floor(rand() * 5)]!,
            createdAt: new Date(Date.parse(`${isoDaysAgo(daysAgo)}T09:00:00Z`) + k * 60_000),
          });
        }
        await db.insert(putts).values(rows);
      }
    }
  }
  await seedCoaching(db, { coachId, squadId: squad!.id, playerIds });
  logger.info("demo scenario seeded");
}
