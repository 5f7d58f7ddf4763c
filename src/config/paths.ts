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
  read: { path: "/read", href: () => "/read" },
  rehearse: { path: "/rehearse", href: () => "/rehearse" },
  train: { path: "/train", href: () => "/train" },
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
} as const;
