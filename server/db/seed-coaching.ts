// The demo coach's two ladders, assigned to the squad with some progress: ladder putts are practice
// putts too (a session per assignment and day), and each assignment's status is what the engine replays.
import { and, eq, inArray } from "drizzle-orm";
import { initialProgress, step } from "../../shared/ladder-engine";
import type { LadderSnapshot } from "../../shared/schemas/assignments";
import type { FailRule, Rung } from "../../shared/schemas/ladders";
import type { Db } from "./client";
import { ladderAssignments, ladders, practiceSessions, putts } from "./schema";

export type CoachingSeedIds = { coachId: string; squadId: string; playerIds: string[] };

const DAY_MS = 86_400_000;

function isoDaysAgo(days: number, today = new Date()): string {
  return new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate() - days)).toISOString().slice(0, 10);
}

/**
 * Per player (in squad order): how far into each ladder they got, as putt outcomes. Written out by hand
 * so the demo tells a story: one junior finished the short ladder, two are on the way, one has not started.
 */
const H = true;
const M = false;
const PROGRESS: Record<string, boolean[][]> = {
  "Three-to-nine": [
    // Every rung passed, with one failed attempt on the 7 ft rung.
    [H, H, H, H, H, H, H, H, H, H, H, M, H, H, M, M, M, H, H, H, H, H, H, H, H, H, H, H, M, H],
    [H, H, H, H, M, H, H, H, M, H, M, H, M],
    [H, M, H, H, H, H, H, H],
    [],
  ],
  "Lag ladder": [[M, M, H, M, H], [], [M, M, M, M, M, M, M, H], []],
};

export async function seedCoaching(db: Db, { coachId, squadId, playerIds }: CoachingSeedIds): Promise<void> {
  const rows = await db
    .select()
    .from(ladders)
    .where(and(eq(ladders.ownerId, coachId), inArray(ladders.name, Object.keys(PROGRESS))));
  const names = Object.keys(PROGRESS);
  rows.sort((a, b) => names.indexOf(a.name) - names.indexOf(b.name));
  const now = Date.now();
  for (const [l, ladder] of rows.entries()) {
    const snapshot: LadderSnapshot = {
      sourceLadderId: ladder.id,
      name: ladder.name,
      description: ladder.description,
      failRule: ladder.failRule as FailRule,
      rungs: ladder.rungs as Rung[],
    };
    const assignedDaysAgo = 10 - l * 3;
    for (const [i, playerId] of playerIds.entries()) {
      const outcomes = PROGRESS[ladder.name]?.[i] ?? [];
      const [assignment] = await db
        .insert(ladderAssignments)
        .values({
          ladderId: ladder.id,
          playerId,
          assignedBy: coachId,
          squadId,
          ladder: snapshot,
          dueDate: isoDaysAgo(-7 - l * 7),
          createdAt: new Date(now - assignedDaysAgo * DAY_MS),
        })
        .returning();
      if (outcomes.length === 0) continue;

      // Played two days after it was assigned, one putt a minute from 10:00 UTC.
      const playedDaysAgo = assignedDaysAgo - 2 - i;
      const date = isoDaysAgo(playedDaysAgo);
      const [session] = await db
        .insert(practiceSessions)
        .values({ playerId, date, notes: `Ladder: ${ladder.name}` })
        .returning({ id: practiceSessions.id });
      const start = Date.parse(`${date}T10:00:00Z`);
      let state = initialProgress(snapshot);
      const values = [];
      for (const [k, holed] of outcomes.entries()) {
        if (state.completed) break;
        const rung = snapshot.rungs[state.rungIndex]!;
        values.push({
          sessionId: session!.id,
          playerId,
          distanceM: rung.distanceM,
          holed,
          missSide: holed ? null : k % 2 === 0 ? "right" : "left",
          missLengthM: holed ? null : rung.distanceM > 3 ? -0.6 : 0.3,
          breakType: rung.breakType ?? null,
          assignmentId: assignment!.id,
          rungIndex: state.rungIndex,
          // Explicit and strictly increasing: progress is replayed in created_at order.
          createdAt: new Date(start + k * 60_000),
        });
        state = step(snapshot, state, holed);
      }
      await db.insert(putts).values(values);
      const last = values.at(-1)!.createdAt;
      await db
        .update(ladderAssignments)
        .set({
          sessionId: session!.id,
          status: state.completed ? "completed" : "in-progress",
          lastActivityAt: last,
          completedAt: state.completed ? last : null,
        })
        .where(eq(ladderAssignments.id, assignment!.id));
    }
  }
}
