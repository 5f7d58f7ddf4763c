// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import { useLocation } from "react-router";
import { renderRoute } from "../../../testing/render";
import { meAnswer, network } from "../../../testing/network";
import { RequireAuth } from "./require-auth";

afterEach(() => {
  cleanup();
});

function SignInPage() {
  const location = useLocation();
  return <p>Sign-in page at {location.pathname + location.search}</p>;
}

test("a signed-out visitor is sent to sign in, with the page to come back to", async () => {
  network.use(meAnswer(null));
  renderRoute(<RequireAuth>Secret page</RequireAuth>, { at: "/account", routes: [{ path: "/sign-in", element: <SignInPage /> }] });
  expect(await screen.findByText("Sign-in page at /sign-in?next=%2Faccount")).toBeInTheDocument();
});

test("a signed-in user sees the page", async () => {
  const me = {
    user: { id: "u1", name: "Ivo Marsh", email: "ivo@example.test", role: "player", emailVerified: true },
    preferences: { units: "metric" },
  };
  network.use(meAnswer(me));
  renderRoute(<RequireAuth>{(m) => `Hello ${m.user.name}`}</RequireAuth>, { at: "/account" });
  expect(await screen.findByText("Hello Ivo Marsh")).toBeInTheDocument();
});

test("a page for coaches is hidden from a player", async () => {
  const me = {
    user: { id: "u1", name: "Ivo Marsh", email: "ivo@example.test", role: "player", emailVerified: true },
    preferences: { units: "metric" },
  };
  network.use(meAnswer(me));
  renderRoute(<RequireAuth roles={["coach"]}>Squad page</RequireAuth>, { at: "/squads" });
  expect(await screen.findByText("This page is for coach accounts.")).toBeInTheDocument();
  expect(screen.queryByText("Squad page")).not.toBeInTheDocument();
});
