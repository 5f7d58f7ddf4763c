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
  resetPassword: { path: "/reset-password", href: (token?: string) => (token ? `/reset-password?token=${encodeURIComponent(token)}` : "/reset-password") },
  account: { path: "/account", href: () => "/account" },

  // the five flows (reserved; routes are registered as each feature lands)
  // `query` is a read's URL query without "?" (see src/features/reads/utils/read-query.ts), so a read can be shared.
  read: { path: "/read", href: (query?: string) => (query ? `/read?${query}` : "/read") },
  breakChart: { path: "/chart", href: (query?: string) => (query ? `/chart?${query}` : "/chart") },
  rehearse: { path: "/rehearse", href: (query?: string) => (query ? `/rehearse?${query}` : "/rehearse") },
  // `query` e.g. "level=club&seed=12345&n=0": the seed replays a round of read training.
  train: { path: "/train", href: (query?: string) => (query ? `/train?${query}` : "/train") },
  practice: { path: "/practice", href: () => "/practice" },
  session: { path: "/practice/:sessionId", href: (sessionId: string) => `/practice/${encodeURIComponent(sessionId)}` },
  greens: { path: "/greens", href: () => "/greens" },
  stats: { path: "/stats", href: () => "/stats" },
  chart: { path: "/stats/chart", href: () => "/stats/chart" },
  squads: { path: "/squads", href: () => "/squads" },
  squad: { path: "/squads/:squadId", href: (squadId: string) => `/squads/${encodeURIComponent(squadId)}` },
  ladders: { path: "/ladders", href: () => "/ladders" },
  ladder: { path: "/ladders/:ladderId", href: (ladderId: string) => `/ladders/${encodeURIComponent(ladderId)}` },

  // development only
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
} as const;
