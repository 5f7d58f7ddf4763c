/** An account younger than this is greeted as new. */
export const NEW_ACCOUNT_MS = 24 * 3600 * 1000;

/** The home page's greeting: a brand-new account is welcomed, a returning one welcomed back. */
export function greeting(name: string, createdAt: string | undefined, now: Date = new Date()): string {
  const age = createdAt === undefined ? Number.NaN : now.getTime() - Date.parse(createdAt);
  return Number.isFinite(age) && age < NEW_ACCOUNT_MS ? `Welcome to Borrowline, ${name}` : `Welcome back, ${name}`;
}
