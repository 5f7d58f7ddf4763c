import type { z } from "zod";
import crypto from "node:crypto";
import { and, between, count, desc, eq, sql } from "drizzle-orm";
import { wilsonInterval } from "../../../shared/stats/wilson";
import {
  DEFAULT_GREEN_LATERAL_M,
  DEFAULT_READ_ERROR_SLOPE_PCT,
  bestPace,
  estimateDispersion,
  type DispersionEstimate,
  type PaceOutcome,
} from "../../../physics";
import { seededUniform } from "../../../shared/seeded-random";
import {
  dispersionQuerySchema,
  makeProbabilityRequestSchema,
  type DispersionResponse,
  type MakeProbabilityResponse,
  type PaceResult,
} from "../../../shared/schemas/make-probability";
import type { Db } from "../../db/client";
import { practiceSessions, putts } from "../../db/schema";
import { cannotStopError, notFound } from "../../lib/http-error";
import { targetPlayerId } from "../../lib/player-access";
import { currentUser, type SessionUser } from "../../middleware/session";
import type { Ctx } from "../../lib/route";

/** The most recent putts the estimate uses (older ones say less about the player's stroke today). */
const MAX_PUTTS = 2000;

/**
 * The player whose dispersion is asked for: the shared read rule (me, a coach's squad player, anyone for an admin).
 * Unlike the stats routes, a player naming someone else gets 404 here rather than 403.
 */
async function readablePlayer(db: Db, viewer: SessionUser, playerId: string | undefined): Promise<string> {
  if (viewer.role === "player" && playerId !== undefined && playerId !== viewer.id) throw notFound("That player");
  return targetPlayerId(db, viewer, playerId);
}

async function dispersionOf(db: Db, playerId: string): Promise<DispersionEstimate> {
  const rows = await db
    .select({
      distanceM: putts.distanceM,
      holed: putts.holed,
      missSide: putts.missSide,
      missLengthM: putts.missLengthM,
      stimpFt: practiceSessions.stimpFt,
    })
    .from(putts)
    .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
    .where(eq(putts.playerId, playerId))
    // The id breaks ties: putts logged in the same instant (a batch from the outbox) must not make the 2000 differ.
    .orderBy(desc(putts.createdAt), desc(putts.id))
    .limit(MAX_PUTTS);
  return estimateDispersion(rows.map((r) => ({ ...r, missSide: r.missSide === "left" || r.missSide === "right" ? r.missSide : null })));
}

function toDispersionResponse(e: DispersionEstimate): DispersionResponse {
  const p = e.prior;
  const range = (median: number, logSd: number): [number, number] => [median * Math.exp(-1.96 * logSd), median * Math.exp(1.96 * logSd)];
  return {
    angleDeg: e.angleDeg,
    pace: e.pace,
    rollPastM: e.rollPastM,
    putts: e.usedPutts,
    prior: {
      angleDeg: p.angleDeg.median,
      pace: p.pace.median,
      angleDegRange: range(p.angleDeg.median, p.angleDeg.logSd),
      paceRange: range(p.pace.median, p.pace.logSd),
      why: p.why,
    },
    priorWeight: e.priorWeight,
    usedPrior: e.usedPrior,
  };
}

export function getDispersion(db: Db) {
  return async ({ req, query }: Ctx<unknown, z.infer<typeof dispersionQuerySchema>>) => {
    const me = currentUser(req);
    const { playerId } = query;
    const target = await readablePlayer(db, me, playerId);
    return toDispersionResponse(await dispersionOf(db, target));
  };
}

const paceResult = (o: PaceOutcome): PaceResult => ({
  rollPastM: o.rollPastM,
  makeProbability: o.makeProbability,
  makeProbabilityStandardError: o.makeProbabilityStandardError,
  secondPuttOver1mProbability: o.secondPuttOverProbability,
  read: o.read,
});

/**
 * The player's logged make rate at about this length (0.8–1.25 × D), so the page never shows odds that contradict
 * it without saying why.
 */
async function loggedNear(db: Db, playerId: string, distanceM: number, odds: number): Promise<MakeProbabilityResponse["logged"]> {
  const fromM = 0.8 * distanceM;
  const toM = 1.25 * distanceM;
  const [row] = await db
    .select({ attempts: count(), made: sql<number>`coalesce(sum(case when ${putts.holed} then 1 else 0 end), 0)::int` })
    .from(putts)
    .where(and(eq(putts.playerId, playerId), between(putts.distanceM, fromM, toM)));
  const attempts = Number(row?.attempts ?? 0);
  const made = Number(row?.made ?? 0);
  const ci95 = wilsonInterval(made, attempts);
  const oddsOutside = ci95 !== null && (odds < ci95[0] || odds > ci95[1]);
  return {
    fromM,
    toM,
    attempts,
    made,
    rate: attempts > 0 ? made / attempts : null,
    ci95,
    oddsOutside,
    why:
      "These odds are for this putt: its slope, its pace, and the misreads and bumps that come with them. Your logged rate " +
      "mixes every putt of about this length you have logged, on whatever slopes they were, and a few dozen putts leave it uncertain.",
  };
}

export function postMakeProbability(db: Db) {
  return async ({ req, body }: Ctx<z.infer<typeof makeProbabilityRequestSchema>>) => {
    const me = currentUser(req);
    const input = body;
    let dispersion: MakeProbabilityResponse["dispersion"];
    if (input.dispersion) {
      dispersion = {
        readSlopePct: DEFAULT_READ_ERROR_SLOPE_PCT,
        greenLateralM: DEFAULT_GREEN_LATERAL_M,
        ...input.dispersion,
        source: "request",
        putts: null,
        usedPrior: null,
      };
    } else {
      const e = await dispersionOf(db, me.id);
      dispersion = {
        angleDeg: e.angleDeg.estimate,
        pace: e.pace.estimate,
        readSlopePct: DEFAULT_READ_ERROR_SLOPE_PCT,
        greenLateralM: DEFAULT_GREEN_LATERAL_M,
        source: "my-putts",
        putts: e.usedPutts,
        usedPrior: e.usedPrior,
      };
    }
    const seed = input.seed ?? crypto.randomInt(0, 2 ** 31 - 1);
    const result = bestPace({
      ...input.read,
      dispersion: {
        angleDeg: dispersion.angleDeg,
        pace: dispersion.pace,
        readSlopePct: dispersion.readSlopePct,
        greenLateralM: dispersion.greenLateralM,
      },
      samples: input.samples,
      random: seededUniform(seed),
      secondPuttRiskMax: input.secondPuttRiskMax,
      secondPuttM: 1,
    });
    if (!result.ok) {
      throw cannotStopError(result.message, "read.slopePct", input.read.stimpFt, result.model.maxStoppableSlopePct);
    }
    const { best, requested, curve, secondPuttRiskMax } = result.result;
    const response: MakeProbabilityResponse = {
      makeProbability: requested.makeProbability,
      makeProbabilityStandardError: requested.makeProbabilityStandardError,
      secondPuttOver1mProbability: requested.secondPuttOverProbability,
      finishes: requested.finishes,
      finishHoled: requested.finishHoled,
      misses: requested.misses,
      bestPace: { ...paceResult(best), meetsRiskLimit: best.meetsRiskLimit },
      defaultPace: paceResult(requested),
      paceCurve: curve.map((c) => ({
        rollPastM: c.rollPastM,
        makeProbability: c.makeProbability,
        secondPuttOver1mProbability: c.secondPuttOverProbability,
      })),
      dispersion,
      logged: await loggedNear(db, me.id, input.read.distanceM, requested.makeProbability),
      seed,
      samples: input.samples,
      secondPuttRiskMax,
    };
    return response;
  };
}
