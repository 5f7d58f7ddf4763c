// The practice plan (issue 17): what a player's log proposes (shared/practice-plan.ts), the plan under way and its
// weekly check. A player starts their own plan (it becomes a ladder assignment to themselves); a coach adopts a
// player's plan into their ladder library, then edits and assigns it through the ladder flows.
import { and, asc, desc, eq, gte, lte } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { buildPracticePlan, type PlanPutt } from "../../../shared/practice-plan";
import { addDays, weeklyCheck } from "../../../shared/practice-plan-weekly";
import type { LadderSnapshot } from "../../../shared/schemas/assignments";
import {
  type ActivePlan,
  type AdoptPlanInput,
  type AdoptPlanResponse,
  type PlanProposal,
  type PlanReady,
  type PracticePlanQuery,
  type PracticePlanResponse,
  type StartPlanResponse,
} from "../../../shared/schemas/practice-plan";
import { DEFAULT_BAND_EDGES_M } from "../../../shared/stats/bands";
import type { UnitSystem } from "../../../shared/units";
import type { Db } from "../../db/client";
import {
  ladderAssignments,
  ladders,
  practicePlans,
  practiceSessions,
  putts,
  roundHoles,
  rounds,
  user,
  userPreferences,
} from "../../db/schema";
import { conflict, notFound } from "../../lib/http-error";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";
import { todayUtc } from "../assignments/assignment-view";

/** The proposal reads the last eight weeks of the log (the player's present form). */
export const PLAN_WINDOW_DAYS = 56;

type DayPutt = PlanPutt & { day: string };

/** Practice putts and each hole's first putt (a one-putt is holed) from `from` to `to`, with their day. */
async function attemptsOf(db: Db, playerId: string, from: string, to: string): Promise<DayPutt[]> {
  const [practice, holes] = await Promise.all([
    db
      .select({ distanceM: putts.distanceM, holed: putts.holed, day: practiceSessions.date })
      .from(putts)
      .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
      .where(and(eq(putts.playerId, playerId), gte(practiceSessions.date, from), lte(practiceSessions.date, to))),
    db
      .select({ distanceM: roundHoles.firstPuttM, putts: roundHoles.putts, day: rounds.date })
      .from(roundHoles)
      .innerJoin(rounds, eq(rounds.id, roundHoles.roundId))
      .where(and(eq(rounds.playerId, playerId), gte(rounds.date, from), lte(rounds.date, to))),
  ]);
  return [...practice, ...holes.filter((h) => h.putts > 0).map((h) => ({ distanceM: h.distanceM, holed: h.putts === 1, day: h.day }))];
}

/** Every logged round: how many, and the putts faced in them (each first putt, and the second when its length is known). */
async function courseOf(db: Db, playerId: string): Promise<{ rounds: number; facedM: number[] }> {
  const rows = await db
    .select({ roundId: roundHoles.roundId, first: roundHoles.firstPuttM, putts: roundHoles.putts, left: roundHoles.leftAfterFirstM })
    .from(roundHoles)
    .innerJoin(rounds, eq(rounds.id, roundHoles.roundId))
    .where(eq(rounds.playerId, playerId));
  const putted = rows.filter((r) => r.putts > 0);
  const facedM = putted.flatMap((r) => (r.putts >= 2 && r.left !== null && r.left > 0 ? [r.first, r.left] : [r.first]));
  return { rounds: new Set(putted.map((r) => r.roundId)).size, facedM };
}

async function playerOf(db: Db, playerId: string): Promise<{ name: string; units: UnitSystem }> {
  const [row] = await db
    .select({ name: user.name, units: userPreferences.units })
    .from(user)
    .leftJoin(userPreferences, eq(userPreferences.userId, user.id))
    .where(eq(user.id, playerId));
  if (!row) throw notFound("That player");
  return { name: row.name, units: row.units === "metric" ? "metric" : "imperial" };
}

/** The proposal from the player's log now: bands in the player's own units. */
async function proposalFor(db: Db, playerId: string, units: UnitSystem, today: string): Promise<{ proposal: PlanProposal; from: string }> {
  const from = addDays(today, -(PLAN_WINDOW_DAYS - 1));
  const [attempts, course] = await Promise.all([attemptsOf(db, playerId, from, today), courseOf(db, playerId)]);
  return { proposal: buildPracticePlan({ putts: attempts, course, edgesM: DEFAULT_BAND_EDGES_M[units], units }), from };
}

type PlanRow = typeof practicePlans.$inferSelect;

async function activeView(db: Db, row: PlanRow, today: string): Promise<ActivePlan> {
  const plan = row.plan as PlanReady;
  const [starter] = await db.select({ id: user.id, name: user.name, role: user.role }).from(user).where(eq(user.id, row.startedBy));
  const log = await attemptsOf(db, row.playerId, addDays(row.startedOn, -PLAN_WINDOW_DAYS), today);
  const check = weeklyCheck(plan, row.startedOn, today, log);
  const role = starter?.role === "coach" || starter?.role === "admin" ? starter.role : "player";
  return {
    id: row.id,
    startedOn: row.startedOn,
    startedBy: { id: row.startedBy, name: starter?.name ?? "", role },
    assignmentId: row.assignmentId,
    ladderId: row.ladderId,
    plan,
    before: check.before,
    weeks: check.weeks,
  };
}

async function latestPlan(db: Db, playerId: string): Promise<PlanRow | undefined> {
  const [row] = await db
    .select()
    .from(practicePlans)
    .where(eq(practicePlans.playerId, playerId))
    .orderBy(desc(practicePlans.createdAt), asc(practicePlans.id))
    .limit(1);
  return row;
}

/** GET /api/practice-plan?playerId= — the player's own, or (coach, admin) a player of theirs. */
export function getPracticePlan(db: Db) {
  return async ({ req, query: qs }: Ctx<unknown, PracticePlanQuery>): Promise<PracticePlanResponse> => {
    const viewer = currentUser(req);
    const playerId = await targetPlayerId(db, viewer, qs.playerId);
    const player = await playerOf(db, playerId);
    const today = todayUtc();
    const { proposal, from } = await proposalFor(db, playerId, player.units, today);
    const row = await latestPlan(db, playerId);
    const out: PracticePlanResponse = {
      playerId,
      playerName: player.name,
      window: { from, to: today },
      proposal,
      active: row ? await activeView(db, row, today) : null,
    };
    return out;
  };
}

function planOrConflict(proposal: PlanProposal): PlanReady {
  if (proposal.status !== "plan") throw conflict(`There is no plan to start yet. ${proposal.message}`);
  return proposal;
}

/** POST /api/practice-plan/start — the signed-in player's proposal becomes their own runnable ladder. */
export function startPracticePlan(db: Db) {
  return async ({ req }: Ctx): Promise<StartPlanResponse> => {
    const me = currentUser(req);
    const player = await playerOf(db, me.id);
    const today = todayUtc();
    const plan = planOrConflict((await proposalFor(db, me.id, player.units, today)).proposal);
    const planId = randomUUID();
    const snapshot: LadderSnapshot = {
      sourceLadderId: planId,
      name: plan.ladder.name,
      description: plan.ladder.description ?? null,
      failRule: plan.ladder.failRule,
      rungs: plan.ladder.rungs,
    };
    const row = await db.transaction(async (tx) => {
      const [assignment] = await tx
        .insert(ladderAssignments)
        .values({ ladderId: null, playerId: me.id, assignedBy: me.id, squadId: null, ladder: snapshot })
        .returning({ id: ladderAssignments.id });
      const [saved] = await tx
        .insert(practicePlans)
        .values({ id: planId, playerId: me.id, startedBy: me.id, startedOn: today, plan, assignmentId: assignment!.id })
        .returning();
      return saved!;
    });
    const out: StartPlanResponse = { assignmentId: row.assignmentId!, active: await activeView(db, row, today) };
    return out;
  };
}

/** POST /api/practice-plan/adopt {playerId} — a coach copies a player's proposal into their own ladder library. */
export function adoptPracticePlan(db: Db) {
  return async ({ req, body: input }: Ctx<AdoptPlanInput>): Promise<AdoptPlanResponse> => {
    const me = currentUser(req);
    // A coach adopts for a player of their squads (another id is a 404); not for themselves.
    if (input.playerId === me.id) throw notFound("That player");
    const playerId = await targetPlayerId(db, me, input.playerId);
    const player = await playerOf(db, playerId);
    const today = todayUtc();
    const plan = planOrConflict((await proposalFor(db, playerId, player.units, today)).proposal);
    const row = await db.transaction(async (tx) => {
      const [ladder] = await tx
        .insert(ladders)
        .values({
          ownerId: me.id,
          name: `${player.name}: ${plan.ladder.name.replace(/^Practice plan: /, "")}`.slice(0, 80),
          description: plan.ladder.description ?? null,
          failRule: plan.ladder.failRule,
          rungs: plan.ladder.rungs,
        })
        .returning({ id: ladders.id });
      const [saved] = await tx
        .insert(practicePlans)
        .values({ playerId, startedBy: me.id, startedOn: today, plan, ladderId: ladder!.id })
        .returning();
      return saved!;
    });
    const out: AdoptPlanResponse = { ladderId: row.ladderId!, active: await activeView(db, row, today) };
    return out;
  };
}
