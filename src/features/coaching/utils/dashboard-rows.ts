// The coach dashboard's rows: one per (player, ladder given), and one for a player with no ladder yet.
import type { CoachedPlayer } from "../api/get-coached-players";
import { statusKey, type StatusKey } from "./rule-words";

export type DashboardRow = {
  id: string;
  assignmentId: string | null;
  playerId: string;
  playerName: string;
  squadIds: string[];
  squadNames: string;
  ladderName: string | null;
  rungReached: number;
  rungsTotal: number;
  attempts: number;
  puttsTaken: number;
  lastActivityAt: string | null;
  dueDate: string | null;
  status: StatusKey | "no-ladder";
};

export function dashboardRows(players: readonly CoachedPlayer[]): DashboardRow[] {
  return players.flatMap((p): DashboardRow[] => {
    const base = {
      playerId: p.id,
      playerName: p.name,
      squadIds: p.squads.map((s) => s.id),
      squadNames: p.squads.map((s) => s.name).join(", "),
    };
    if (p.assignments.length === 0) {
      return [
        {
          ...base,
          id: `player-${p.id}`,
          assignmentId: null,
          ladderName: null,
          rungReached: 0,
          rungsTotal: 0,
          attempts: 0,
          puttsTaken: 0,
          lastActivityAt: null,
          dueDate: null,
          status: "no-ladder",
        },
      ];
    }
    return p.assignments.map((a) => ({
      ...base,
      id: a.id,
      assignmentId: a.id,
      ladderName: a.ladderName,
      rungReached: a.status === "completed" ? a.rungsTotal : a.rungReached,
      rungsTotal: a.rungsTotal,
      attempts: a.attempts,
      puttsTaken: a.puttsTaken,
      lastActivityAt: a.lastActivityAt,
      dueDate: a.dueDate,
      status: statusKey(a.status, a.overdue),
    }));
  });
}

export type DashboardFilter = { squadId: string; status: string; text: string };

/** Squad ("" = all), status ("" = all) and free text over player and ladder names, without case. */
export function filterRows(rows: readonly DashboardRow[], { squadId, status, text }: DashboardFilter): DashboardRow[] {
  const needle = text.trim().toLowerCase();
  return rows.filter(
    (r) =>
      (!squadId || r.squadIds.includes(squadId)) &&
      (!status || r.status === status) &&
      (!needle || r.playerName.toLowerCase().includes(needle) || (r.ladderName ?? "").toLowerCase().includes(needle)),
  );
}
