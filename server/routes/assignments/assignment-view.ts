// An assignment as the API answers it: its ladder copy, and its progress replayed from the stored putts.
// Shared by the player's assignment handlers and the coach's views.
import { asc, inArray, type SQL } from "drizzle-orm";
import { replay, type LadderProgress } from "../../../shared/ladder-engine";
import type {
  Assignment,
  AssignmentDetail,
  AssignmentStatus,
  AssignmentSummary,
  LadderPutt,
  LadderSnapshot,
} from "../../../shared/schemas/assignments";
import type { Db } from "../../db/client";
import { ladderAssignments, putts, user } from "../../db/schema";

export type AssignmentRow = typeof ladderAssignments.$inferSelect;

export function todayUtc(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

export function statusOf(progress: LadderProgress): AssignmentStatus {
  if (progress.completed) return "completed";
  return progress.puttsTaken > 0 ? "in-progress" : "assigned";
}

/** The putts of each assignment in the order they were played (created_at, then id). */
export async function puttsOf(db: Pick<Db, "select">, assignmentIds: string[]): Promise<Map<string, LadderPutt[]>> {
  const byAssignment = new Map<string, LadderPutt[]>(assignmentIds.map((id) => [id, []]));
  if (assignmentIds.length === 0) return byAssignment;
  const rows = await db.select().from(putts).where(inArray(putts.assignmentId, assignmentIds)).orderBy(asc(putts.createdAt), asc(putts.id));
  for (const p of rows) {
    byAssignment.get(p.assignmentId!)?.push({
      id: p.id,
      rungIndex: p.rungIndex ?? 0,
      distanceM: p.distanceM,
      holed: p.holed,
      missSide: p.missSide,
      missLengthM: p.missLengthM,
      createdAt: p.createdAt.toISOString(),
    });
  }
  return byAssignment;
}

/** Views of `rows` (in their order), with each assignment's putts when `withPutts`. */
export async function assignmentViews(db: Db, rows: AssignmentRow[], withPutts = false): Promise<AssignmentDetail[]> {
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const userIds = [...new Set(rows.flatMap((r) => [r.playerId, r.assignedBy]))];
  const [names, played] = await Promise.all([
    db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, userIds)),
    puttsOf(db, ids),
  ]);
  const nameOf = new Map(names.map((n) => [n.id, n.name]));
  const today = todayUtc();
  return rows.map((r) => {
    const ladder = r.ladder as LadderSnapshot;
    const list = played.get(r.id) ?? [];
    const progress = replay(
      ladder,
      list.map((p) => p.holed),
    );
    return {
      id: r.id,
      ladder,
      player: { id: r.playerId, name: nameOf.get(r.playerId) ?? "" },
      assignedBy: { id: r.assignedBy, name: nameOf.get(r.assignedBy) ?? "" },
      squadId: r.squadId,
      sessionId: r.sessionId,
      dueDate: r.dueDate,
      overdue: !progress.completed && r.dueDate !== null && r.dueDate < today,
      status: statusOf(progress),
      createdAt: r.createdAt.toISOString(),
      lastActivityAt: list.at(-1)?.createdAt ?? null,
      completedAt: progress.completed ? (list.at(-1)?.createdAt ?? null) : null,
      progress,
      currentRung: progress.completed ? null : (ladder.rungs[progress.rungIndex] ?? null),
      ...(withPutts ? { putts: list } : {}),
    } as AssignmentDetail;
  });
}

/** Without the putts: what list answers carry. */
export function withoutPutts({ putts: _putts, ...a }: Assignment & { putts?: LadderPutt[] }): Assignment {
  return a;
}

export function summaryOf(a: Assignment): AssignmentSummary {
  const total = a.ladder.rungs.length;
  return {
    id: a.id,
    ladderName: a.ladder.name,
    player: a.player,
    squadId: a.squadId,
    status: a.status,
    overdue: a.overdue,
    rungsPassed: a.progress.completed ? total : a.progress.bestRungIndex,
    rungReached: a.progress.bestRungIndex + 1,
    rungsTotal: total,
    currentRung: a.progress.rungIndex + 1,
    attempts: a.progress.attempts,
    puttsTaken: a.progress.puttsTaken,
    dueDate: a.dueDate,
    createdAt: a.createdAt,
    lastActivityAt: a.lastActivityAt,
    completedAt: a.completedAt,
  };
}

/** Assignment rows matching `where`, oldest first. */
export async function assignmentRows(db: Db, where: SQL | undefined): Promise<AssignmentRow[]> {
  return db.select().from(ladderAssignments).where(where).orderBy(asc(ladderAssignments.createdAt), asc(ladderAssignments.id));
}
