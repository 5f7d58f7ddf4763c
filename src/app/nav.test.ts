import { expect, test } from "vitest";
import { visibleNavItems, type NavItem } from "./nav";

const items: NavItem[] = [
  { label: "Home", to: "/" },
  { label: "Account", to: "/account", signedIn: true },
  { label: "Squads", to: "/squads", roles: ["coach", "admin"] },
  { label: "Dev mailbox", to: "/dev/mailbox", when: "devMail" },
];

const labels = (list: NavItem[]) => list.map((i) => i.label);

test("a signed-out visitor sees only the public items", () => {
  expect(labels(visibleNavItems(items, { role: null, devMail: false }))).toEqual(["Home"]);
});

test("a player does not see coach-only items", () => {
  expect(labels(visibleNavItems(items, { role: "player", devMail: false }))).toEqual(["Home", "Account"]);
});

test("a coach sees coach items and the dev mailbox when the server has one", () => {
  expect(labels(visibleNavItems(items, { role: "coach", devMail: true }))).toEqual(["Home", "Account", "Squads", "Dev mailbox"]);
});

test("an area's item stays active on every page of the area, and only there", async () => {
  const { navItems, isNavItemActive } = await import("./nav");
  const reading = navItems.find((i) => i.label === "Read a putt")!;
  expect(isNavItemActive("/rehearse", reading)).toBe(true);
  expect(isNavItemActive("/chart", reading)).toBe(true);
  expect(isNavItemActive("/reads-elsewhere", reading)).toBe(false);
  const coaching = navItems.find((i) => i.label === "Coaching")!;
  expect(isNavItemActive("/ladders/new", coaching)).toBe(true);
  expect(isNavItemActive("/practice", coaching)).toBe(false);
});

test("the section tabs follow the page and the role", async () => {
  const { sectionFor } = await import("./nav");
  expect(sectionFor("/train", null)?.items.map((i) => i.label)).toEqual(["Read a putt", "Rehearse", "Read training", "Break chart"]);
  expect(sectionFor("/squads", "coach")?.label).toBe("Coaching");
  expect(sectionFor("/squads", "player")?.label).toBe("Your ladders and squads");
  expect(sectionFor("/practice", "player")).toBeUndefined();
});
