import { paths } from "../../../config/paths";

/** Returns `next` if it is a path on this site, else the home page, so a crafted link cannot send
 *  someone elsewhere after signing in. */
export function safeNext(next: string | null | undefined, fallback: string = paths.home.href()): string {
  if (!next) return fallback;
  if (!next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  if ([paths.signIn.path, paths.signUp.path].some((p) => next === p || next.startsWith(`${p}?`))) return fallback;
  return next;
}
