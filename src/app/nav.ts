import { paths } from "../config/paths";
import type { Role } from "../features/auth/api/get-me";

export type NavItem = {
  label: string;
  to: string;
  /** Match only this exact path (for "/"). */
  end?: boolean;
  /** Shown only to signed-in users with one of these roles. Hiding only: the server decides. */
  roles?: ReadonlyArray<Role>;
  /** Shown only to signed-in users. */
  signedIn?: boolean;
  /** Shown only when a condition the shell knows about holds. */
  when?: "devMail";
};

// The main navigation. Add an item here when its route is registered in router.tsx.
export const navItems: ReadonlyArray<NavItem> = [
  { label: "Home", to: paths.home.href(), end: true },
  { label: "Read a putt", to: paths.read.href() },
  { label: "Break chart", to: paths.breakChart.href() },
  { label: "Rehearse", to: paths.rehearse.href() },
  { label: "Read training", to: paths.train.href() },
  // The practice log's other pages (Greens, Rounds) sit in its own sub-navigation (practiceNavItems), so the phone menu stays short.
  { label: "Practice", to: paths.practice.href(), signedIn: true },
  { label: "Make rates", to: paths.stats.href(), signedIn: true },
  // coaching (issue 6)
  { label: "My ladders", to: paths.myLadders.href(), roles: ["player"] },
  { label: "Squads", to: paths.squads.href(), roles: ["coach", "admin"] },
  { label: "Ladders", to: paths.ladders.href(), roles: ["coach", "admin"] },
  { label: "Coach dashboard", to: paths.coach.href(), roles: ["coach", "admin"] },
  { label: "Account", to: paths.account.href(), signedIn: true },
  { label: "Dev mailbox", to: paths.mailbox.href(), when: "devMail" },
];

/** The practice log's own tabs, shown at the top of each of its pages (src/app/layout/practice-nav.tsx). */
export const practiceNavItems: ReadonlyArray<NavItem> = [
  { label: "Practice", to: paths.practice.href(), signedIn: true },
  { label: "Rounds", to: paths.rounds.href(), signedIn: true },
  { label: "Greens", to: paths.greens.href(), signedIn: true },
  { label: "Make rates", to: paths.stats.href(), signedIn: true },
];

export type NavContext = { role: Role | null; devMail: boolean };

export function visibleNavItems(items: ReadonlyArray<NavItem>, ctx: NavContext): NavItem[] {
  return items.filter((item) => {
    if ((item.signedIn || item.roles) && !ctx.role) return false;
    if (item.roles && ctx.role && !item.roles.includes(ctx.role)) return false;
    if (item.when === "devMail" && !ctx.devMail) return false;
    return true;
  });
}
