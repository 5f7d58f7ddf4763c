/**
 * Roles. Who may do what is decided on the server, per route: requireRole(...) in each <resource>.routes.ts, and
 * ownership or squad membership in the handler's query (lib/player-access.ts, lib/green-access.ts). No second
 * policy table: the route declarations are the policy (tests/api/authorization-matrix.test.ts checks them).
 */
export const ROLES = ["player", "coach", "admin"] as const;
export type Role = (typeof ROLES)[number];

/** Roles a person may choose at sign-up. Admin is never self-service. */
export const SIGN_UP_ROLES = ["player", "coach"] as const satisfies readonly Role[];
export type SignUpRole = (typeof SIGN_UP_ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
