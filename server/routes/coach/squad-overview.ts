// The squad at a glance: each player's recent volume, make rates by band against their own past, strokes
// gained per putt now and before, and where their ladders stand. Shared by the JSON view and the CSV export.
import { and, eq, inArray } from "drizzle-orm";
import type { SquadOverview, SquadOverviewPlayer } from "../../../shared/schemas/squads";
import { bandsFromEdges, DEFAULT_BAND_EDGES_M } from "../../../shared/stats/bands";
import { summarisePutts, type PracticePutt } from "../../../shared/stats/strokes-gained";
import { METRES_PER_FOOT } from "../../../shared/units";
import type { Db } from "../../db/client";
import { ladderAssignments, practiceSessions, putts, squadMembers, user, userPreferences } from "../../db/schema";
import type { SessionUser } from "../../middleware/session";
import { assignmentRows, assignmentViews, summaryOf } from "../assignments/assignment-view";
import { periodCounts } from "../stats/band-counts";
import { ownedBy } from "../squads/squad-access";

const addDays = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const rate = (made: number, attempts: number) => ({ attempts, made, rate: attempts === 0 ? null : made / attempts });

export async function squadOverview(
  db: Db,
  viewer: SessionUser,
  squad: { id: string; name: string },
  days: number,
  now = new Date(),
): Promise<SquadOverview> {
  const today = now.toISOString().slice(0, 10);
  const recentFrom = addDays(today, -(days - 1));
  const [prefs] = await db.select({ units: userPreferences.units }).from(userPreferences).where(eq(userPreferences.userId, viewer.id));
  const edges = DEFAULT_BAND_EDGES_M[prefs?.units === "metric" ? "metric" : "imperial"];
  const bands = bandsFromEdges(edges);

  const members = await db
    .select({ id: user.id, name: user.name, email: user.email })
    .from(squadMembers)
    .innerJoin(user, eq(user.id, squadMembers.playerId))
    .where(eq(squadMembers.squadId, squad.id))
    .orderBy(user.name, user.id);
  const ids = members.map((m) => m.id);

  const rows =
    ids.length === 0
      ? []
      : await db
          .select({
            playerId: putts.playerId,
            sessionId: putts.sessionId,
            date: practiceSessions.date,
            distanceM: putts.distanceM,
            holed: putts.holed,
            missLengthM: putts.missLengthM,
          })
          .from(putts)
          .innerJoin(practiceSessions, eq(practiceSessions.id, putts.sessionId))
          .where(inArray(putts.playerId, ids));
  const assignments =
    ids.length === 0
      ? []
      : (
          await assignmentViews(
            db,
            await assignmentRows(db, and(inArray(ladderAssignments.playerId, ids), ownedBy(ladderAssignments.assignedBy, viewer))),
          )
        ).map(summaryOf);

  const players: SquadOverviewPlayer[] = [];
  for (const m of members) {
    const mine = rows.filter((r) => r.playerId === m.id);
    const recent: PracticePutt[] = [];
    const past: PracticePutt[] = [];
    const recentSessions = new Set<string>();
    let lastSession: string | null = null;
    for (const r of mine) {
      if (r.date >= recentFrom && r.date <= today) {
        recent.push(r);
        recentSessions.add(r.sessionId);
      } else if (r.date < recentFrom) past.push(r);
      if (lastSession === null || r.date > lastSession) lastSession = r.date;
    }
    const sr = summarisePutts(recent);
    const sp = summarisePutts(past);
    const counts = new Map(
      (
        await periodCounts(
          db,
          {
            playerId: m.id,
            source: "practice",
            a: { from: "1900-01-01", to: addDays(recentFrom, -1) },
            b: { from: recentFrom, to: today },
          },
          edges,
        )
      ).map((c) => [c.band, c]),
    );
    const ladders = assignments.filter((a) => a.player.id === m.id);
    const latest = ladders.at(-1);
    players.push({
      ...m,
      recent: {
        sessions: recentSessions.size,
        putts: sr.putts,
        strokesGainedPerPutt: sr.putts === 0 ? null : sr.strokesGained / sr.putts,
        lastSession,
      },
      past: { putts: sp.putts, strokesGainedPerPutt: sp.putts === 0 ? null : sp.strokesGained / sp.putts },
      bands: bands.map((_, i) => {
        const c = counts.get(i);
        return { recent: rate(c?.bMade ?? 0, c?.bAttempts ?? 0), past: rate(c?.aMade ?? 0, c?.aAttempts ?? 0) };
      }),
      ladders: {
        active: ladders.filter((a) => a.status !== "completed").length,
        completed: ladders.filter((a) => a.status === "completed").length,
        overdue: ladders.filter((a) => a.overdue).length,
        latest: latest
          ? {
              name: latest.ladderName,
              status: latest.status,
              overdue: latest.overdue,
              rungReached: latest.rungReached,
              rungsTotal: latest.rungsTotal,
            }
          : null,
      },
    });
  }
  return {
    squad: { id: squad.id, name: squad.name },
    days,
    recentFrom,
    today,
    bands: bands.map((b) => ({ fromM: b.fromM, toM: b.toM })),
    players,
  };
}

/** The overview as spreadsheet rows (one per player); text cells go through the CSV helper's formula guard. */
export function overviewCsvRows(o: SquadOverview, units: "metric" | "imperial"): { fields: string[]; data: (string | number | null)[][] } {
  const len = (m: number) => (units === "metric" ? `${Number(m.toFixed(1))} m` : `${Math.round(m / METRES_PER_FOOT)} ft`);
  const bandName = (b: { fromM: number; toM: number | null }) =>
    b.toM === null ? `${len(b.fromM)} and over` : `${len(b.fromM)} to ${len(b.toM)}`;
  const pct = (r: { rate: number | null }) => (r.rate === null ? null : Math.round(r.rate * 1000) / 10);
  const sg = (v: number | null) => (v === null ? null : Math.round(v * 1000) / 1000);
  const fields = [
    "Player",
    "E-mail",
    `Sessions (last ${o.days} days)`,
    `Putts (last ${o.days} days)`,
    "Last session",
    ...o.bands.flatMap((b) => [`${bandName(b)} recent %`, `${bandName(b)} before %`]),
    "Strokes gained per putt, recent",
    "Strokes gained per putt, before",
    "Ladders active",
    "Ladders completed",
    "Ladders overdue",
    "Latest ladder",
  ];
  const data = o.players.map((p) => [
    p.name,
    p.email,
    p.recent.sessions,
    p.recent.putts,
    p.recent.lastSession,
    ...p.bands.flatMap((b) => [pct(b.recent), pct(b.past)]),
    sg(p.recent.strokesGainedPerPutt),
    sg(p.past.strokesGainedPerPutt),
    p.ladders.active,
    p.ladders.completed,
    p.ladders.overdue,
    p.ladders.latest
      ? `${p.ladders.latest.name} (rung ${p.ladders.latest.rungReached} of ${p.ladders.latest.rungsTotal}, ${p.ladders.latest.overdue ? "overdue" : p.ladders.latest.status})`
      : null,
  ]);
  return { fields, data };
}
