// Query keys for the practice log (greens, sessions, putts). Mutations invalidate by prefix; all sit under `practiceKeys.all`.
import type { PuttListParams } from "./get-putts";
import type { SessionListParams } from "./get-sessions";

export const practiceKeys = {
  all: ["practice"] as const,
  greens: () => [...practiceKeys.all, "greens"] as const,
  green: (id: string) => [...practiceKeys.greens(), id] as const,
  /** The squads a coach may share a green with. */
  coachedSquads: () => [...practiceKeys.all, "coached-squads"] as const,
  sessions: () => [...practiceKeys.all, "sessions"] as const,
  sessionList: (params: SessionListParams) => [...practiceKeys.sessions(), "list", params] as const,
  session: (id: string) => [...practiceKeys.sessions(), "one", id] as const,
  putts: () => [...practiceKeys.all, "putts"] as const,
  puttList: (params: PuttListParams) => [...practiceKeys.putts(), "list", params] as const,
  sessionPutts: (sessionId: string) => [...practiceKeys.putts(), "session", sessionId] as const,
  rounds: () => [...practiceKeys.all, "rounds"] as const,
  roundList: (page: number) => [...practiceKeys.rounds(), "list", page] as const,
  round: (id: string) => [...practiceKeys.rounds(), "one", id] as const,
  /** Mutation key of "log a putt": its defaults (mutationFn, retry) are registered once, so a restored queue can run. */
  addPutt: () => [...practiceKeys.all, "add-putt"] as const,
};
