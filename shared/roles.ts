/** Roles and the policy map: the server enforces it; the client only uses it to hide UI. */
export const ROLES = ["player", "coach", "admin"] as const;
export type Role = (typeof ROLES)[number];

/** Roles a person may choose at sign-up. Admin is never self-service. */
export const SIGN_UP_ROLES = ["player", "coach"] as const satisfies readonly Role[];
export type SignUpRole = (typeof SIGN_UP_ROLES)[number];

export const PERMISSIONS = {
  "reads:save": ["player", "coach", "admin"],
  "practice:own": ["player", "coach", "admin"],
  "squads:manage": ["coach", "admin"],
  "ladders:manage": ["coach", "admin"],
  "users:manage": ["admin"],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
