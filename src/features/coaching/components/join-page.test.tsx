// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { fakeFetch, renderRoute } from "../../../testing/render";
import { JoinPage } from "./join-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: { signOut: vi.fn(async () => ({ error: null })) } }));

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const TOKEN = "t".repeat(43);
const preview = (status: string) => ({ squad: { name: "Larkspur juniors" }, coach: { name: "Dana Whitcombe" }, email: "ivo@example.test", status, expiresAt: "2030-01-15T00:00:00.000Z" });
const signedOut = { status: 401, body: { error: { code: "UNAUTHORIZED", message: "Sign in" } } };
const signedIn = (email: string, role = "player") => ({ body: { user: { id: "u1", name: "Ivo Marsh", email, role, emailVerified: true }, preferences: { units: "imperial" } } });

function renderJoin(answers: Parameters<typeof fakeFetch>[0]) {
  vi.stubGlobal("fetch", vi.fn(fakeFetch(answers)));
  return renderRoute(<JoinPage token={TOKEN} />, { at: `/join/${TOKEN}` });
}

test("signed out: the preview, then a player account or sign-in that comes back here", async () => {
  renderJoin({ "/api/me": signedOut, [`/api/invitations/${TOKEN}`]: { body: preview("pending") } });
  expect(await screen.findByRole("heading", { level: 1, name: "Larkspur juniors" })).toBeInTheDocument();
  expect(screen.getByText("ivo@example.test")).toBeInTheDocument();
  expect(await screen.findByRole("link", { name: "I already have an account — sign in" })).toHaveAttribute("href", `/sign-in?next=${encodeURIComponent(`/join/${TOKEN}`)}`);
  await userEvent.setup().click(screen.getByRole("button", { name: "Create your player account" }));
  expect(screen.getByLabelText("E-mail")).toHaveValue("ivo@example.test");
  expect(screen.queryByRole("radio")).not.toBeInTheDocument();
});

test("signed in with the invited e-mail: one button joins the squad", async () => {
  renderJoin({
    "/api/me": signedIn("IVO@example.test"),
    [`/api/invitations/${TOKEN}`]: { body: preview("pending") },
    [`/api/invitations/${TOKEN}/accept`]: { body: { squad: { id: "s1", name: "Larkspur juniors", coach: { id: "c1", name: "Dana Whitcombe" } }, joinedAt: "2030-01-01T00:00:00.000Z" } },
  });
  await userEvent.setup().click(await screen.findByRole("button", { name: "Join Larkspur juniors" }));
  expect(await screen.findByText("You are in Larkspur juniors")).toBeInTheDocument();
});

test("signed in with another e-mail: says which e-mail the link is for", async () => {
  renderJoin({ "/api/me": signedIn("sam@example.test"), [`/api/invitations/${TOKEN}`]: { body: preview("pending") } });
  expect(await screen.findByText("This invitation is for another e-mail")).toBeInTheDocument();
  expect(screen.queryByRole("button", { name: /Join/ })).not.toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Sign out" })).toBeInTheDocument();
});

test("used, expired and withdrawn links each say so; an unknown token says the link does not work", async () => {
  renderJoin({ "/api/me": signedOut, [`/api/invitations/${TOKEN}`]: { body: preview("accepted") } });
  expect(await screen.findByText("This invitation has already been used")).toBeInTheDocument();
  cleanup();
  renderJoin({ "/api/me": signedOut, [`/api/invitations/${TOKEN}`]: { body: preview("expired") } });
  expect(await screen.findByText("This invitation has expired")).toBeInTheDocument();
  cleanup();
  renderJoin({ "/api/me": signedOut, [`/api/invitations/${TOKEN}`]: { body: preview("revoked") } });
  expect(await screen.findByText("This invitation was withdrawn")).toBeInTheDocument();
  cleanup();
  renderJoin({ "/api/me": signedOut });
  expect(await screen.findByText("This invitation link does not work")).toBeInTheDocument();
});
