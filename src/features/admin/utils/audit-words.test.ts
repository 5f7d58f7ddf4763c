import { expect, test } from "vitest";
import type { AuditEntry } from "#shared/schemas/admin";
import { auditWords } from "./audit-words";

const entry = (over: Partial<AuditEntry>): AuditEntry => ({
  id: "1",
  actor: { id: "a", email: "admin@example.test" },
  action: "user.unban",
  target: { id: "t", email: "lee@example.test" },
  detail: null,
  createdAt: "2026-12-02T06:00:00Z",
  ...over,
});

test("each action reads as a plain sentence", () => {
  expect(auditWords(entry({ action: "role.set", detail: { from: "player", to: "coach" } }))).toBe(
    "changed the role of lee@example.test from player to coach",
  );
  expect(auditWords(entry({ action: "user.ban", detail: { reason: "Shared the account" } }))).toBe(
    "banned lee@example.test (“Shared the account”)",
  );
  expect(auditWords(entry({ action: "sessions.revoke" }))).toBe("signed lee@example.test out everywhere");
  expect(auditWords(entry({ action: "password-reset.send", target: { id: null, email: null } }))).toBe(
    "sent an account that no longer exists a password-reset e-mail",
  );
});
