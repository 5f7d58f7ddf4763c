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
