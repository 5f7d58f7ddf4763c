import type { AuditEntry } from "#shared/schemas/admin";

/** One audit entry in plain words: "changed the role of lee@… from player to coach". */
export function auditWords(e: AuditEntry): string {
  const who = e.target.email ?? "an account that no longer exists";
  const d = e.detail ?? {};
  switch (e.action) {
    case "role.set":
      return `changed the role of ${who} from ${String(d.from)} to ${String(d.to)}`;
    case "user.ban":
      return `banned ${who}${typeof d.reason === "string" ? ` (“${d.reason}”)` : ""}`;
    case "user.unban":
      return `lifted the ban on ${who}`;
    case "sessions.revoke":
      return `signed ${who} out everywhere`;
    case "password-reset.send":
      return `sent ${who} a password-reset e-mail`;
    default:
      return `${String(e.action)} on ${who}`;
  }
}
