// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test, vi } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { apiError, http, HttpResponse, meAnswer, network } from "../../../testing/network";
import { JoinPage } from "./join-page";

vi.mock("../../../lib/auth-client", () => ({ authClient: { signOut: vi.fn(async () => ({ error: null })) } }));

afterEach(() => {
  cleanup();
});

const TOKEN = "t".repeat(43);
const preview = (status: string) => ({
  squad: { name: "Larkspur juniors" },
  coach: { name: "Dana Whitcombe" },
  email: "ivo@example.test",
  status,
  expiresAt: "2030-01-15T00:00:00.000Z",
});
const signedOut = meAnswer(null);
const signedIn = (email: string, role = "player") =>
  meAnswer({ user: { id: "u1", name: "Ivo Marsh", email, role, emailVerified: true }, preferences: { units: "imperial" } });
const invitation = (status: string) => http.get(`/api/invitations/${TOKEN}`, () => HttpResponse.json(preview(status)));
const unknownToken = http.get(`/api/invitations/${TOKEN}`, () => apiError(404, "not_found", "Invitation was not found."));

function renderJoin(...handlers: Parameters<typeof network.use>) {
  network.resetHandlers(...handlers);
  return renderRoute(<JoinPage token={TOKEN} />, { at: `/join/${TOKEN}` });
}

test("signed out: the preview, then a player account or sign-in that comes back here", async () => {
  renderJoin(signedOut, invitation("pending"));
  expect(await screen.findByRole("heading", { level: 1, name: "Larkspur juniors" })).toBeInTheDocument();
  expect(screen.getByText("ivo@example.test")).toBeInTheDocument();
  expect(await screen.findByRole("link", { name: "I already have an account — sign in" })).toHaveAttribute(
    "href",
    `/sign-in?next=${encodeURIComponent(`/join/${TOKEN}`)}`,
  );
  await userEvent.setup().click(screen.getByRole("button", { name: "Create your player account" }));
  expect(screen.getByLabelText("E-mail")).toHaveValue("ivo@example.test");
  expect(screen.queryByRole("radio")).not.toBeInTheDocument();
});

test("signed in with the invited e-mail: one button joins the squad", async () => {
  renderJoin(
    signedIn("IVO@example.test"),
    invitation("pending"),
    http.post(`/api/invitations/${TOKEN}/accept`, () =>
      HttpResponse.json({
        squad: { id: "s1", name: "Larkspur juniors", coach: { id: "c1", name: "Dana Whitcombe" } },
        joinedAt: "2030-01-01T00:00:00.000Z",
      }),
    ),
  );
  await userEvent.setup().click(await screen.findByRole("button", { name: "Join Larkspur juniors" }));
  expect(await screen.findByText("You are in Larkspur juniors")).toBeInTheDocument();
});

test("signed in with another e-mail: says which e-mail the link is for", async () => {
  renderJoin(signedIn("sam@example.test"), invitation("pending"));
  expect(await screen.findByText("This invitation is for another e-mail")).toBeInTheDocument();
  expect(screen.queryByRole("button", { name: /Join/ })).not.toBeInTheDocument();
  expect(screen.getByRole("button", { name: "Sign out" })).toBeInTheDocument();
});

test("used, expired and withdrawn links each say so; an unknown token says the link does not work", async () => {
  renderJoin(signedOut, invitation("accepted"));
  expect(await screen.findByText("This invitation has already been used")).toBeInTheDocument();
  cleanup();
  renderJoin(signedOut, invitation("expired"));
  expect(await screen.findByText("This invitation has expired")).toBeInTheDocument();
  cleanup();
  renderJoin(signedOut, invitation("revoked"));
  expect(await screen.findByText("This invitation was withdrawn")).toBeInTheDocument();
  cleanup();
  renderJoin(signedOut, unknownToken);
  expect(await screen.findByText("This invitation link does not work")).toBeInTheDocument();
});
