// Query keys for coaching: squads, invitations, ladders, assignments and the coach's views.
// Everything sits under `coachingKeys.all`; mutations invalidate by the narrowest prefix that covers them.
export const coachingKeys = {
  all: ["coaching"] as const,
  squads: () => [...coachingKeys.all, "squads"] as const,
  squad: (id: string) => [...coachingKeys.squads(), id] as const,
  invitations: (squadId: string) => [...coachingKeys.all, "invitations", squadId] as const,
  invitationPreview: (token: string) => [...coachingKeys.all, "invitation-preview", token] as const,
  ladders: () => [...coachingKeys.all, "ladders"] as const,
  ladder: (id: string) => [...coachingKeys.ladders(), id] as const,
  assignments: () => [...coachingKeys.all, "assignments"] as const,
  assignment: (id: string) => [...coachingKeys.assignments(), id] as const,
  coach: () => [...coachingKeys.all, "coach"] as const,
  coachPlayers: () => [...coachingKeys.coach(), "players"] as const,
  coachPlayer: (playerId: string) => [...coachingKeys.coach(), "player", playerId] as const,
  notes: (playerId: string) => [...coachingKeys.all, "notes", playerId] as const,
  squadOverview: (squadId: string, days: number) => [...coachingKeys.coach(), "overview", squadId, days] as const,
  makeRates: (playerId: string) => [...coachingKeys.coach(), "make-rates", playerId] as const,
  /** Mutation key of "play a ladder putt", one of the outbox's (src/lib/outbox.ts): its defaults are registered once. */
  addLadderPutt: () => [...coachingKeys.all, "add-ladder-putt"] as const,
};
