import type { z } from "zod";
import { and, asc, desc, eq, inArray, or, type SQL } from "drizzle-orm";
import { ERROR_CODES } from "../../../shared/errors";
import { replay, step } from "../../../shared/ladder-engine";
import { assignInputSchema, ladderPuttInputSchema, type LadderSnapshot } from "../../../shared/schemas/assignments";
import { idSchema } from "../../../shared/schemas/common";
import type { AppDeps } from "../../deps";
import type { Db } from "../../db/client";
import { ladderAssignments, practiceSessions, putts, squadMembers, squads, user } from "../../db/schema";
import { badRequest, conflict, HttpError, notFound } from "../../lib/http-error";
import { linkBase } from "../../lib/link-origin";
import { linkMail } from "../../lib/mailer";
import { currentUser, type SessionUser } from "../../middleware/session";
import { parseOrThrow } from "../../middleware/validate";
import { reply, type Ctx } from "../../lib/route";
import { findLadder } from "../ladders/ladders.handlers";
import { inSquadsOf } from "../../lib/player-access";
import { findOwnSquad, squadsOfPlayers } from "../squads/squad-access";
import { assignmentRows, assignmentViews, statusOf, todayUtc, withoutPutts } from "./assignment-view";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/**
 * Gives a ladder to players of the coach's own squads: listed by id, or every member of one squad.
 * Each assignment keeps a copy of the ladder as it is now; each player gets an e-mail with a link.
 */
export function createAssignments({ database, mailer, config, logger }: AppDeps) {
  const db = database.db;
  return async ({ req, body }: Ctx<z.infer<typeof assignInputSchema>>) => {
    const me = currentUser(req);
    const ladder = await findLadder(db, me, parseOrThrow(idSchema, req.params.id, "id"));
    const input = body;

    let targets: { playerId: string; squadId: string }[];
    if (input.squadId) {
      const squad = await findOwnSquad(db, me, input.squadId);
      const members = await db.select({ playerId: squadMembers.playerId }).from(squadMembers).where(eq(squadMembers.squadId, squad.id));
      if (members.length === 0) throw badRequest("That squad has no players yet.", { squadId: "the squad has no players yet" });
      targets = members.map((m) => ({ playerId: m.playerId, squadId: squad.id }));
    } else {
      const ids = [...new Set(input.playerIds!)];
      const squadsOf = await squadsOfPlayers(db, me, ids);
      const missing = input.playerIds!.map((id, i) => [i, id] as const).filter(([, id]) => !squadsOf.has(id));
      if (missing.length > 0) {
        throw new HttpError(
          404,
          ERROR_CODES.notFound,
          `Not players in your squads: ${[...new Set(missing.map(([, id]) => id))].join(", ")}.`,
          Object.fromEntries(missing.map(([i]) => [`playerIds.${i}`, "not a player in your squads"])),
        );
      }
      targets = ids.map((playerId) => ({ playerId, squadId: squadsOf.get(playerId)![0]!.id }));
    }

    const snapshot: LadderSnapshot = {
      sourceLadderId: ladder.id,
      name: ladder.name,
      description: ladder.description ?? null,
      failRule: ladder.failRule,
      rungs: ladder.rungs,
    };
    const rows = await db
      .insert(ladderAssignments)
      .values(
        targets.map((t) => ({
          // Built-in ladders have no row to point at; the copy names its source.
          ladderId: ladder.builtIn ? null : ladder.id,
          playerId: t.playerId,
          assignedBy: me.id,
          squadId: t.squadId,
          ladder: snapshot,
          dueDate: input.dueDate ?? null,
        })),
      )
      .returning();

    const emails = await db
      .select({ id: user.id, email: user.email })
      .from(user)
      .where(
        inArray(
          user.id,
          rows.map((r) => r.playerId),
        ),
      );
    const emailOf = new Map(emails.map((e) => [e.id, e.email]));
    const due = input.dueDate ? `, due ${input.dueDate}` : "";
    for (const row of rows) {
      const to = emailOf.get(row.playerId);
      if (!to) continue;
      const intro =
        `${me.name} assigned you the ladder "${ladder.name}" (${ladder.rungs.length} rung${ladder.rungs.length === 1 ? "" : "s"}${due}). ` +
        "Take it to the practice green and log each putt; your progress is saved as you go.";
      try {
        await mailer.send(
          linkMail(
            to,
            `You have a new ladder: ${ladder.name}`,
            intro,
            "Open the ladder",
            `${linkBase(config.links, req)}/ladders/run/${row.id}`,
          ),
        );
      } catch (err) {
        // The assignment stands: the player also finds it in the app.
        logger.error({ err, to }, "assignment e-mail could not be sent");
      }
    }
    const views = await assignmentViews(db, rows);
    return { assignments: views.map(withoutPutts) };
  };
}

export function listMyAssignments(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const rows = (await assignmentRows(db, eq(ladderAssignments.playerId, me.id))).reverse();
    return { assignments: (await assignmentViews(db, rows)).map(withoutPutts) };
  };
}

/**
 * Who may read an assignment: its player; the coach who assigned it or runs its squad, while the player is still
 * in one of that coach's squads; an admin.
 */
function readableBy(db: Db, me: SessionUser): SQL | undefined {
  if (me.role === "admin") return undefined;
  const coached = db.select({ id: squads.id }).from(squads).where(eq(squads.coachId, me.id));
  return or(
    eq(ladderAssignments.playerId, me.id),
    and(
      or(eq(ladderAssignments.assignedBy, me.id), inArray(ladderAssignments.squadId, coached)),
      inSquadsOf(me.id, ladderAssignments.playerId),
    ),
  );
}

export function getAssignment(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = parseOrThrow(idSchema, req.params.id, "id");
    const rows = await assignmentRows(db, and(eq(ladderAssignments.id, id), readableBy(db, me)));
    if (rows.length === 0) throw notFound("Assignment");
    const [view] = await assignmentViews(db, rows, true);
    return view!;
  };
}

/** The player's own assignment, locked for the rest of the transaction so putts are applied one at a time. */
async function lockOwnAssignment(tx: Tx, me: SessionUser, rawId: unknown) {
  const id = parseOrThrow(idSchema, rawId, "id");
  const [row] = await tx
    .select()
    .from(ladderAssignments)
    .where(and(eq(ladderAssignments.id, id), eq(ladderAssignments.playerId, me.id)))
    .for("update");
  if (!row) throw notFound("Assignment");
  return row;
}

async function playedOutcomes(tx: Tx, assignmentId: string) {
  return tx
    .select({ id: putts.id, holed: putts.holed, createdAt: putts.createdAt })
    .from(putts)
    .where(eq(putts.assignmentId, assignmentId))
    .orderBy(asc(putts.createdAt), asc(putts.id));
}

/** Today's practice session for this assignment: the one it already has if dated today, else a new one. */
async function sessionForToday(tx: Tx, assignment: typeof ladderAssignments.$inferSelect, name: string): Promise<string> {
  const today = todayUtc();
  if (assignment.sessionId) {
    const [s] = await tx
      .select({ id: practiceSessions.id })
      .from(practiceSessions)
      .where(and(eq(practiceSessions.id, assignment.sessionId), eq(practiceSessions.date, today)));
    if (s) return s.id;
  }
  const [created] = await tx
    .insert(practiceSessions)
    .values({ playerId: assignment.playerId, date: today, notes: `Ladder: ${name}` })
    .returning({ id: practiceSessions.id });
  return created!.id;
}

async function answerWith(db: Db, id: string, status: number) {
  const [view] = await assignmentViews(db, await assignmentRows(db, eq(ladderAssignments.id, id)), true);
  return reply(status, view!);
}

/**
 * One ladder putt: stored as a practice putt too (session, distance of the current rung, assignment and
 * rung index), then the progress is replayed from all the assignment's putts. A retried request with the
 * same clientId is stored once and answers 200 with the current state.
 */
export function addLadderPutt(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof ladderPuttInputSchema>>) => {
    const me = currentUser(req);
    const input = body;
    const { id, created } = await db.transaction(async (tx) => {
      const a = await lockOwnAssignment(tx, me, req.params.id);
      if (input.clientId) {
        const [dup] = await tx
          .select({ assignmentId: putts.assignmentId })
          .from(putts)
          .where(and(eq(putts.playerId, me.id), eq(putts.clientId, input.clientId)));
        if (dup && dup.assignmentId !== a.id) throw conflict("That clientId was already used for another putt.");
        if (dup) return { id: a.id, created: false };
      }
      const ladder = a.ladder as LadderSnapshot;
      const played = await playedOutcomes(tx, a.id);
      const state = replay(
        ladder,
        played.map((p) => p.holed),
      );
      if (state.completed) throw conflict("This ladder is already completed; it takes no more putts.");
      const rung = ladder.rungs[state.rungIndex]!;
      const sessionId = await sessionForToday(tx, a, ladder.name);
      // Strictly after the previous putt, so the replay order never depends on clock resolution.
      const last = played.at(-1)?.createdAt;
      const now = new Date();
      const createdAt = last && last.getTime() >= now.getTime() ? new Date(last.getTime() + 1) : now;
      const inserted = await tx
        .insert(putts)
        .values({
          sessionId,
          playerId: me.id,
          clientId: input.clientId ?? null,
          distanceM: rung.distanceM,
          holed: input.holed,
          missSide: input.missSide ?? null,
          missLengthM: input.missLengthM ?? null,
          breakType: rung.breakType ?? null,
          assignmentId: a.id,
          rungIndex: state.rungIndex,
          createdAt,
        })
        .onConflictDoNothing({ target: [putts.playerId, putts.clientId] })
        .returning({ id: putts.id });
      if (inserted.length === 0) throw conflict("That clientId was already used for another putt.");
      const after = step(ladder, state, input.holed);
      await tx
        .update(ladderAssignments)
        .set({ sessionId, status: statusOf(after), lastActivityAt: createdAt, completedAt: after.completed ? createdAt : null })
        .where(eq(ladderAssignments.id, a.id));
      return { id: a.id, created: true };
    });
    return answerWith(db, id, created ? 201 : 200);
  };
}

/** Takes back the latest putt of the assignment (also from the practice log); a completed ladder reopens. */
export function undoLastLadderPutt(db: Db) {
  return async ({ req }: Ctx) => {
    const me = currentUser(req);
    const id = await db.transaction(async (tx) => {
      const a = await lockOwnAssignment(tx, me, req.params.id);
      const [last] = await tx
        .select({ id: putts.id })
        .from(putts)
        .where(eq(putts.assignmentId, a.id))
        .orderBy(desc(putts.createdAt), desc(putts.id))
        .limit(1);
      if (!last) throw notFound("A ladder putt to undo");
      await tx.delete(putts).where(eq(putts.id, last.id));
      const played = await playedOutcomes(tx, a.id);
      const state = replay(
        a.ladder as LadderSnapshot,
        played.map((p) => p.holed),
      );
      await tx
        .update(ladderAssignments)
        .set({
          status: statusOf(state),
          lastActivityAt: played.at(-1)?.createdAt ?? null,
          completedAt: state.completed ? played.at(-1)!.createdAt : null,
        })
        .where(eq(ladderAssignments.id, a.id));
      return a.id;
    });
    return answerWith(db, id, 200);
  };
}
