// Every URL the client knows, in one place. `path` is the router pattern, `href()` builds a link.
// Only some of these have routes registered today (see src/app/router.tsx); the rest are reserved
// so links and routes agree when the features land.

function withNext(path: string, next?: string): string {
  return next ? `${path}?next=${encodeURIComponent(next)}` : path;
}

export const paths = {
  home: { path: "/", href: () => "/" },

  // account
  signIn: { path: "/sign-in", href: (next?: string) => withNext("/sign-in", next) },
  signUp: { path: "/sign-up", href: (next?: string) => withNext("/sign-up", next) },
  forgotPassword: { path: "/forgot-password", href: () => "/forgot-password" },
  resetPassword: {
    path: "/reset-password",
    href: (token?: string) => (token ? `/reset-password?token=${encodeURIComponent(token)}` : "/reset-password"),
  },
  account: { path: "/account", href: () => "/account" },

  // the five flows (reserved; routes are registered as each feature lands)
  // `query` is a read's URL query without "?" (see src/lib/read-url.ts), so a read can be shared.
  read: { path: "/read", href: (query?: string) => (query ? `/read?${query}` : "/read") },
  breakChart: { path: "/chart", href: (query?: string) => (query ? `/chart?${query}` : "/chart") },
  rehearse: { path: "/rehearse", href: (query?: string) => (query ? `/rehearse?${query}` : "/rehearse") },
  // `query` e.g. "level=club&seed=12345&n=0": the seed replays a round of read training.
  train: { path: "/train", href: (query?: string) => (query ? `/train?${query}` : "/train") },
  // `query` keeps the history tables' state (tab, sort, page, filters) in the URL.
  practice: { path: "/practice", href: (query?: string) => (query ? `/practice?${query}` : "/practice") },
  session: { path: "/practice/:sessionId", href: (sessionId: string) => `/practice/${encodeURIComponent(sessionId)}` },
  // practice log (issue 5); "import" outranks ":sessionId" in React Router.
  practiceImport: { path: "/practice/import", href: () => "/practice/import" },
  // practice plan (issue 17); "plan" outranks ":sessionId" too.
  practicePlan: { path: "/practice/plan", href: () => "/practice/plan" },
  greens: { path: "/greens", href: () => "/greens" },
  green: { path: "/greens/:greenId", href: (greenId: string) => `/greens/${encodeURIComponent(greenId)}` },
  // green height maps (issue 8): the map, upload and surface reads of one green.
  greenMap: { path: "/greens/:greenId/map", href: (greenId: string) => `/greens/${encodeURIComponent(greenId)}/map` },
  rounds: { path: "/rounds", href: () => "/rounds" },
  round: { path: "/rounds/:roundId", href: (roundId: string) => `/rounds/${encodeURIComponent(roundId)}` },
  stats: { path: "/stats", href: () => "/stats" },
  chart: { path: "/stats/chart", href: () => "/stats/chart" },
  squads: { path: "/squads", href: () => "/squads" },
  squad: { path: "/squads/:squadId", href: (squadId: string) => `/squads/${encodeURIComponent(squadId)}` },
  ladders: { path: "/ladders", href: () => "/ladders" },
  ladder: { path: "/ladders/:ladderId", href: (ladderId: string) => `/ladders/${encodeURIComponent(ladderId)}` },
  // coaching (issue 6): static segments ("new", "mine", "run") outrank ":ladderId" in React Router.
  ladderNew: { path: "/ladders/new", href: () => "/ladders/new" },
  ladderEdit: { path: "/ladders/:ladderId/edit", href: (ladderId: string) => `/ladders/${encodeURIComponent(ladderId)}/edit` },
  myLadders: { path: "/ladders/mine", href: () => "/ladders/mine" },
  runLadder: { path: "/ladders/run/:assignmentId", href: (assignmentId: string) => `/ladders/run/${encodeURIComponent(assignmentId)}` },
  join: { path: "/join/:token", href: (token: string) => `/join/${encodeURIComponent(token)}` },
  coach: { path: "/coach", href: () => "/coach" },
  coachPlayer: { path: "/coach/players/:playerId", href: (playerId: string) => `/coach/players/${encodeURIComponent(playerId)}` },

  // admin screens (issue 15)
  admin: { path: "/admin", href: () => "/admin" },
  adminCoaching: { path: "/admin/coaching", href: () => "/admin/coaching" },
  adminAudit: { path: "/admin/audit", href: () => "/admin/audit" },

  // the local inbox when no SMTP_URL is set (admins only)
  mailbox: { path: "/dev/mailbox", href: () => "/dev/mailbox" },
} as const;

/** Server endpoints the client calls (same origin). */
export const apiPaths = {
  authBase: "/api/auth",
  me: "/api/me",
  mePreferences: "/api/me/preferences",
  devMail: "/api/dev/mail",
  readsSolve: "/api/reads/solve",
  readsChart: "/api/reads/chart",
  reads: "/api/reads",
  read: (id: string) => `/api/reads/${encodeURIComponent(id)}`,
  greens: "/api/greens",
  trainingAttempts: "/api/training/attempts",
  // practice log and make rates (issue 5)
  green: (id: string) => `/api/greens/${encodeURIComponent(id)}`,
  greenSquad: (id: string) => `/api/greens/${encodeURIComponent(id)}/squad`,
  greenStimpReadings: (id: string) => `/api/greens/${encodeURIComponent(id)}/stimp-readings`,
  greenStimpReading: (id: string, readingId: string) =>
    `/api/greens/${encodeURIComponent(id)}/stimp-readings/${encodeURIComponent(readingId)}`,
  sessions: "/api/sessions",
  practiceSession: (id: string) => `/api/sessions/${encodeURIComponent(id)}`,
  sessionPutts: (id: string) => `/api/sessions/${encodeURIComponent(id)}/putts`,
  putts: "/api/putts",
  putt: (id: string) => `/api/putts/${encodeURIComponent(id)}`,
  rounds: "/api/rounds",
  round: (id: string) => `/api/rounds/${encodeURIComponent(id)}`,
  roundHole: (id: string, holeNumber: number) => `/api/rounds/${encodeURIComponent(id)}/holes/${holeNumber}`,
  csvPreview: "/api/csv/putts/preview",
  csvImport: "/api/csv/putts/import",
  csvPuttsExport: "/api/csv/putts/export",
  csvSessionsExport: "/api/csv/sessions/export",
  statsMakeRates: "/api/stats/make-rates",
  statsTrend: "/api/stats/trend",
  statsCompare: "/api/stats/compare",
  statsBaseline: "/api/stats/baseline",
  statsSessions: "/api/stats/sessions",
  statsMisses: "/api/stats/misses",
  // the coach's view of a player and a squad, notes, admin (issue 15)
  playerNotes: (playerId: string) => `/api/players/${encodeURIComponent(playerId)}/notes`,
  squadOverview: (id: string) => `/api/coach/squads/${encodeURIComponent(id)}/overview`,
  squadOverviewExport: (id: string) => `/api/coach/squads/${encodeURIComponent(id)}/overview/export`,
  invitationResend: (id: string) => `/api/invitations/${encodeURIComponent(id)}/resend`,
  adminUsers: "/api/admin/users",
  adminUserAction: (id: string, action: "role" | "ban" | "unban" | "revoke-sessions" | "password-reset") =>
    `/api/admin/users/${encodeURIComponent(id)}/${action}`,
  adminAudit: "/api/admin/audit",
  adminCoaching: "/api/admin/coaching",
  // coaching (issue 6)
  squads: "/api/squads",
  squad: (id: string) => `/api/squads/${encodeURIComponent(id)}`,
  squadMember: (id: string, playerId: string) => `/api/squads/${encodeURIComponent(id)}/members/${encodeURIComponent(playerId)}`,
  squadLeave: (id: string) => `/api/squads/${encodeURIComponent(id)}/leave`,
  squadInvitations: (id: string) => `/api/squads/${encodeURIComponent(id)}/invitations`,
  invitation: (idOrToken: string) => `/api/invitations/${encodeURIComponent(idOrToken)}`,
  invitationAccept: (token: string) => `/api/invitations/${encodeURIComponent(token)}/accept`,
  ladders: "/api/ladders",
  ladder: (id: string) => `/api/ladders/${encodeURIComponent(id)}`,
  ladderCopy: (id: string) => `/api/ladders/${encodeURIComponent(id)}/copy`,
  ladderAssignments: (id: string) => `/api/ladders/${encodeURIComponent(id)}/assignments`,
  assignments: "/api/assignments",
  assignment: (id: string) => `/api/assignments/${encodeURIComponent(id)}`,
  assignmentPutts: (id: string) => `/api/assignments/${encodeURIComponent(id)}/putts`,
  assignmentLastPutt: (id: string) => `/api/assignments/${encodeURIComponent(id)}/putts/last`,
  coachPlayers: "/api/coach/players",
  coachPlayer: (playerId: string) => `/api/coach/players/${encodeURIComponent(playerId)}`,
  coachSquadAssignments: (id: string) => `/api/coach/squads/${encodeURIComponent(id)}/assignments`,
  // personal make probability and green height maps (issue 8)
  readsMakeProbability: "/api/reads/make-probability",
  myDispersion: "/api/players/me/dispersion",
  greenHeightMap: (id: string) => `/api/greens/${encodeURIComponent(id)}/height-map`,
  // practice plan (issue 17)
  practicePlan: "/api/practice-plan",
  practicePlanStart: "/api/practice-plan/start",
  practicePlanAdopt: "/api/practice-plan/adopt",
  greenSurfaceSolve: (id: string) => `/api/greens/${encodeURIComponent(id)}/reads/solve`,
} as const;
