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
import { DEMO_WEEKS, demoSessions, demoStimpFt } from "./seed-putts";

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
  await db
    .insert(account)
    .values({ id: crypto.randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(password) });
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
  // and joined the squad a few days before their first logged session (no session of player i is older than DEMO_WEEKS weeks + i days).
  const at = (daysAgo: number, hourUtc: number) => new Date(Date.parse(`${isoDaysAgo(daysAgo)}T00:00:00Z`) + hourUtc * 3_600_000);
  const firstSessionDaysAgo = (i: number) => DEMO_WEEKS * 7 + i; // no session of player i is older than this
  await createAccount(db, DEMO_ADMIN, "admin", DEMO_PASSWORD, at(DEMO_WEEKS * 7 + 30, 10));
  const coachId = await createAccount(db, DEMO_COACH, "coach", DEMO_PASSWORD, at(DEMO_WEEKS * 7 + 21, 17));
  const playerIds: string[] = [];
  for (const [i, p] of DEMO_PLAYERS.entries())
    playerIds.push(await createAccount(db, p, "player", DEMO_PASSWORD, at(firstSessionDaysAgo(i) + 4 + i, 18)));

  const [green] = await db
    .insert(greens)
    .values({ ownerId: coachId, name: DEMO_GREEN.name, locationNote: DEMO_GREEN.locationNote })
    .returning();
  await db.insert(stimpReadings).values([
    { greenId: green!.id, measuredOn: isoDaysAgo(DEMO_WEEKS * 7), stimpFt: demoStimpFt(0), note: "After rain, slower" },
    { greenId: green!.id, measuredOn: isoDaysAgo(7), stimpFt: DEMO_GREEN.stimpFt },
  ]);

  const [squad] = await db
    .insert(squads)
    .values({ coachId, ...DEMO_SQUAD, createdAt: at(DEMO_WEEKS * 7 + 20, 9) })
    .returning();
  await db
    .insert(squadMembers)
    .values(playerIds.map((playerId, i) => ({ squadId: squad!.id, playerId, joinedAt: at(firstSessionDaysAgo(i) + 2, 19) })));
  // The club's practice green is the squad's: its juniors see it, log on it and read on its map (issue 14).
  await db.update(greens).set({ squadId: squad!.id }).where(eq(greens.id, green!.id));
  await db
    .insert(ladders)
    .values(
      DEMO_LADDERS.map((l) => ({ ownerId: coachId, ...l, createdAt: at(DEMO_WEEKS * 7 + 19, 20), updatedAt: at(DEMO_WEEKS * 7 + 19, 20) })),
    );

  for (const [i, p] of DEMO_PLAYERS.entries()) {
    const playerId = playerIds[i]!;
    for (const s of demoSessions(p, rand)) {
      const daysAgo = (DEMO_WEEKS - 1 - s.week) * 7 + (6 - s.dayOffset) + i;
      const [session] = await db
        .insert(practiceSessions)
        .values({
          playerId,
          date: isoDaysAgo(daysAgo),
          greenId: green!.id,
          stimpFt: s.stimpFt,
          conditions: s.week < 2 ? "Damp, slow after rain" : "Dry and true",
          tags: s.week < 2 ? ["damp"] : ["dry"],
        })
        .returning();
      await db.insert(putts).values(
        s.putts.map((putt, k) => ({
          sessionId: session!.id,
          playerId,
          ...putt,
          createdAt: new Date(Date.parse(`${isoDaysAgo(daysAgo)}T09:00:00Z`) + k * 60_000),
        })),
      );
    }
  }
  await seedCoaching(db, { coachId, squadId: squad!.id, playerIds });
  logger.info("demo scenario seeded");
}
