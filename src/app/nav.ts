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
  /** Paths that belong to this item's area: it shows as active on any of them. */
  match?: readonly string[];
  /** Shown only when a condition the shell knows about holds. */
  when?: "devMail";
};

// The main navigation: one item per area of the product, so the bar fits a desktop and the phone menu stays
// short. An area's pages are reached through its section tabs (sectionNavs below). Add an item here only when
// its route is registered in router.tsx.
export const navItems: ReadonlyArray<NavItem> = [
  { label: "Read a putt", to: paths.read.href(), match: ["/read", "/rehearse", "/train", "/chart"] },
  { label: "Practice", to: paths.practice.href(), signedIn: true, match: ["/practice", "/rounds", "/greens", "/stats"] },
  { label: "My ladders", to: paths.myLadders.href(), roles: ["player"], match: ["/ladders/mine", "/ladders/run", "/squads"] },
  { label: "Coaching", to: paths.coach.href(), roles: ["coach", "admin"], match: ["/coach", "/squads", "/ladders"] },
  { label: "Admin", to: paths.admin.href(), roles: ["admin"], match: ["/admin"] },
];

/** Tabs across the pages of one area, shown by the app shell on those pages. */
export type SectionNav = { label: string; match: readonly string[]; roles?: ReadonlyArray<Role>; items: ReadonlyArray<NavItem> };

export const sectionNavs: ReadonlyArray<SectionNav> = [
  {
    label: "Reading putts",
    match: ["/read", "/rehearse", "/train", "/chart"],
    items: [
      { label: "Read a putt", to: paths.read.href() },
      { label: "Rehearse", to: paths.rehearse.href() },
      { label: "Read training", to: paths.train.href() },
      { label: "Break chart", to: paths.breakChart.href() },
    ],
  },
  {
    label: "Coaching",
    roles: ["coach", "admin"],
    match: ["/coach", "/squads", "/ladders"],
    items: [
      { label: "Dashboard", to: paths.coach.href() },
      { label: "Squads", to: paths.squads.href() },
      { label: "Ladders", to: paths.ladders.href() },
    ],
  },
  {
    label: "Admin",
    roles: ["admin"],
    match: ["/admin"],
    items: [
      { label: "Accounts", to: paths.admin.href() },
      { label: "Squads and ladders", to: paths.adminCoaching.href() },
      { label: "Audit", to: paths.adminAudit.href() },
    ],
  },
  {
    label: "Your ladders and squads",
    roles: ["player"],
    match: ["/ladders/mine", "/ladders/run", "/squads"],
    items: [
      { label: "My ladders", to: paths.myLadders.href() },
      { label: "My squads", to: paths.squads.href() },
    ],
  },
];

/** Whether `pathname` is `prefix` or below it. */
export function isUnder(pathname: string, prefix: string): boolean {
  return pathname === prefix || pathname.startsWith(prefix.endsWith("/") ? prefix : `${prefix}/`);
}

/** The section whose tabs belong on this page, if any. */
export function sectionFor(pathname: string, role: Role | null): SectionNav | undefined {
  return sectionNavs.find((s) => (!s.roles || (role !== null && s.roles.includes(role))) && s.match.some((m) => isUnder(pathname, m)));
}

/** A nav item is active on its own page and, with `match`, anywhere in its area. */
export function isNavItemActive(pathname: string, item: NavItem): boolean {
  if (item.match) return item.match.some((m) => isUnder(pathname, m));
  return item.end ? pathname === item.to : isUnder(pathname, item.to.split("?")[0]!);
}

export type NavContext = { role: Role | null; devMail: boolean };

export function visibleNavItems(items: ReadonlyArray<NavItem>, ctx: NavContext): NavItem[] {
  return items.filter((item) => {
    if ((item.signedIn || item.roles) && !ctx.role) return false;
    if (item.roles && ctx.role && !item.roles.includes(ctx.role)) return false;
    if (item.when === "devMail" && !ctx.devMail) return false;
    return true;
  });
}

/** Tabs across the practice log's pages (rendered by the practice pages themselves). */
export const practiceNavItems: ReadonlyArray<NavItem> = [
  // "Practice" is the log itself: not active on the plan under it (/practice/plan).
  { label: "Practice", to: paths.practice.href(), signedIn: true, end: true },
  { label: "Rounds", to: paths.rounds.href(), signedIn: true },
  { label: "Greens", to: paths.greens.href(), signedIn: true },
  { label: "Make rates", to: paths.stats.href(), signedIn: true },
  { label: "Plan", to: paths.practicePlan.href(), signedIn: true },
];
