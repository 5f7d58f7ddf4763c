// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, expect, test } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { Toaster } from "../../../components/ui/toaster";
import { renderRoute } from "../../../testing/render";
import { HttpResponse, http, meAnswer, serve } from "../../../testing/network";
import { VerifyEmailNotice } from "./verify-email-notice";

afterEach(() => {
  cleanup();
  sessionStorage.clear();
});

const unverified = {
  user: { id: "u1", name: "Leena Park", email: "leena@example.test", role: "player", emailVerified: false },
  preferences: { units: "imperial" },
};

test("'Send again' asks better-auth's endpoint for a new link to the user's address, and says so", async () => {
  // The real auth client (loaded when the button is used), answered by the network mock.
  const calls = serve(
    meAnswer(unverified),
    http.post("/api/auth/send-verification-email", () => HttpResponse.json({ status: true })),
  );
  renderRoute(
    <>
      <VerifyEmailNotice />
      <Toaster />
    </>,
    { at: "/" },
  );
  await userEvent.click(await screen.findByRole("button", { name: "Send again" }));
  expect(await screen.findByText("Sent a new confirmation link to leena@example.test.")).toBeInTheDocument();
  const sent = calls.filter((c) => c.method === "POST");
  expect(sent).toHaveLength(1);
  expect(sent[0]!.path).toBe("/api/auth/send-verification-email");
  expect(sent[0]!.body).toMatchObject({ email: "leena@example.test", callbackURL: "/" });
});
