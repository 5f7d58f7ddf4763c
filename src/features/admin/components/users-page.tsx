import { formatDate } from "#shared/format";
import { useState } from "react";
import { toast } from "../../../lib/toast";
import { Alert, Button, ConfirmDialog, EmptyState, InputField, PageHeader, SelectField } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useAdminAction, useAdminUsers, type AdminActionName, type AdminUser, type UsersQuery } from "../api/admin";

const ROLE_WORDS: Record<string, string> = { player: "Player", coach: "Coach", admin: "Admin" };

type Pending = { user: AdminUser; action: "ban" | "revoke-sessions" | "password-reset" } | null;

function UserRow({ u, me, onAsk }: { u: AdminUser; me: string; onAsk: (p: NonNullable<Pending>) => void }) {
  const act = useAdminAction();
  const self = u.id === me;
  const run = (action: AdminActionName, body: unknown, done: string) =>
    act.mutate({ userId: u.id, action, body }, { onSuccess: () => toast.success(done), onError: (e) => toast.error(errorMessage(e)) });
  return (
    <li className="flex flex-col gap-3 py-4 lg:flex-row lg:items-center lg:justify-between" data-testid="admin-user">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-semibold text-ink-900">{u.name}</span>
          {self ? <span className="rounded-full bg-ink-900/5 px-2 py-0.5 text-xs font-medium text-ink-600">you</span> : null}
          {u.banned ? <span className="rounded-full bg-bad-50 px-2 py-0.5 text-xs font-medium text-bad-800">Banned</span> : null}
          {!u.emailVerified ? (
            <span className="rounded-full bg-warn-50 px-2 py-0.5 text-xs font-medium text-warn-800">E-mail not confirmed</span>
          ) : null}
        </p>
        <p className="text-sm break-all text-ink-500">
          {u.email} · joined {formatDate(u.createdAt)}
          {u.banned && u.banReason ? ` · ban: ${u.banReason}` : ""}
        </p>
      </div>
      <div className="flex flex-wrap items-end gap-2">
        {u.role === "admin" ? (
          <span className="inline-flex min-h-11 items-center px-2 text-sm font-medium text-ink-700">
            Admin{self ? " (cannot be changed here)" : ""}
          </span>
        ) : (
          <SelectField
            label={<span className="sr-only">Role of {u.name}</span>}
            value={u.role}
            disabled={act.isPending}
            options={[
              { value: "player", label: "Player" },
              { value: "coach", label: "Coach" },
            ]}
            onChange={(e) => run("role", { role: e.target.value }, `${u.name} is now a ${ROLE_WORDS[e.target.value]?.toLowerCase()}.`)}
          />
        )}
        {self ? null : u.banned ? (
          <Button
            size="sm"
            variant="secondary"
            pending={act.isPending}
            onClick={() => run("unban", undefined, `${u.name} can sign in again.`)}
          >
            Lift ban
          </Button>
        ) : (
          <Button size="sm" variant="secondary" onClick={() => onAsk({ user: u, action: "ban" })}>
            Ban
          </Button>
        )}
        <Button
          size="sm"
          variant="secondary"
          aria-label={`Sign ${u.name} out everywhere`}
          onClick={() => onAsk({ user: u, action: "revoke-sessions" })}
        >
          Sign out everywhere
        </Button>
        <Button
          size="sm"
          variant="secondary"
          aria-label={`Send ${u.name} a password-reset e-mail`}
          onClick={() => onAsk({ user: u, action: "password-reset" })}
        >
          Send password reset
        </Button>
      </div>
    </li>
  );
}

/** Accounts: find one, change its role between player and coach, ban, sign out everywhere, send a reset e-mail. */
export function AdminUsersPage({ me }: { me: string }) {
  const [draft, setDraft] = useState("");
  const [q, setQ] = useState<UsersQuery>({ field: "email", page: 1 });
  const users = useAdminUsers(q);
  const act = useAdminAction();
  const [pending, setPending] = useState<Pending>(null);
  const [reason, setReason] = useState("");
  const pages = users.data ? Math.max(1, Math.ceil(users.data.total / users.data.pageSize)) : 1;

  const confirm = () => {
    if (!pending) return;
    const { user: u, action } = pending;
    const done =
      action === "ban"
        ? `${u.name} is banned and signed out.`
        : action === "revoke-sessions"
          ? `${u.name} is signed out on every device.`
          : `A password-reset e-mail went to ${u.email}.`;
    act.mutate(
      { userId: u.id, action, body: action === "ban" ? (reason.trim() ? { reason: reason.trim() } : {}) : undefined },
      {
        onSuccess: () => {
          toast.success(done);
          setPending(null);
          setReason("");
        },
        onError: (e) => toast.error(errorMessage(e)),
      },
    );
  };

  return (
    <>
      <title>Accounts · Admin · Borrowline</title>
      <PageHeader
        eyebrow="Admin"
        title="Accounts"
        description="Everyone with a Borrowline account. Every change you make here is recorded in the audit list."
      />
      <form
        role="search"
        className="mb-4 grid gap-3 sm:grid-cols-[1fr_10rem_10rem_auto] sm:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          setQ({ ...q, search: draft.trim() || undefined, page: 1 });
        }}
      >
        <InputField
          label="Search"
          type="search"
          value={draft}
          onChange={(e) => setDraft(e.target.value)}
          placeholder={q.field === "email" ? "part of an e-mail address" : "part of a name"}
        />
        <SelectField
          label="In"
          value={q.field}
          options={[
            { value: "email", label: "E-mail" },
            { value: "name", label: "Name" },
          ]}
          onChange={(e) => setQ({ ...q, field: e.target.value as UsersQuery["field"], page: 1 })}
        />
        <SelectField
          label="Role"
          value={q.role ?? ""}
          options={[
            { value: "", label: "Any" },
            { value: "player", label: "Players" },
            { value: "coach", label: "Coaches" },
            { value: "admin", label: "Admins" },
          ]}
          onChange={(e) => setQ({ ...q, role: (e.target.value || undefined) as UsersQuery["role"], page: 1 })}
        />
        <Button type="submit">Search</Button>
      </form>
      {users.isError ? (
        <Alert
          tone="error"
          title="Could not load the accounts"
          action={
            <Button size="sm" variant="secondary" onClick={() => void users.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(users.error)}
        </Alert>
      ) : !users.data ? (
        <div className="h-48 animate-pulse rounded-xl bg-ink-900/5" aria-label="Loading the accounts" />
      ) : users.data.users.length === 0 ? (
        <EmptyState title="No accounts match">Try part of the address or name, or another role.</EmptyState>
      ) : (
        <>
          <p className="text-sm text-ink-500" aria-live="polite">
            {users.data.total} {users.data.total === 1 ? "account" : "accounts"}
            {q.search ? ` with “${q.search}” in the ${q.field === "email" ? "e-mail" : "name"}` : ""}
          </p>
          <ul className="divide-y divide-ink-900/10 rounded-(--radius-card) bg-white px-4 ring-1 ring-ink-900/10 sm:px-5">
            {users.data.users.map((u) => (
              <UserRow key={u.id} u={u} me={me} onAsk={setPending} />
            ))}
          </ul>
          {pages > 1 ? (
            <nav aria-label="Pages" className="mt-4 flex items-center gap-3">
              <Button size="sm" variant="secondary" disabled={q.page <= 1} onClick={() => setQ({ ...q, page: q.page - 1 })}>
                Previous
              </Button>
              <span className="text-sm text-ink-600">
                Page {q.page} of {pages}
              </span>
              <Button size="sm" variant="secondary" disabled={q.page >= pages} onClick={() => setQ({ ...q, page: q.page + 1 })}>
                Next
              </Button>
            </nav>
          ) : null}
        </>
      )}
      <ConfirmDialog
        open={pending !== null}
        title={
          pending?.action === "ban"
            ? `Ban ${pending.user.name}?`
            : pending?.action === "revoke-sessions"
              ? `Sign ${pending?.user.name} out on every device?`
              : `Send ${pending?.user.name} a password-reset e-mail?`
        }
        confirmLabel={pending?.action === "ban" ? "Yes, ban" : pending?.action === "revoke-sessions" ? "Yes, sign out" : "Send it"}
        tone={pending?.action === "ban" ? "danger" : "primary"}
        busy={act.isPending}
        onCancel={() => {
          setPending(null);
          setReason("");
        }}
        onConfirm={confirm}
      >
        {pending?.action === "ban" ? (
          <div className="flex flex-col gap-3">
            <p>
              They are signed out at once (within a minute on a device that was already open) and cannot sign in until the ban is lifted.
              Their data stays.
            </p>
            <InputField label="Reason (they do not see it)" value={reason} maxLength={200} onChange={(e) => setReason(e.target.value)} />
          </div>
        ) : pending?.action === "revoke-sessions" ? (
          <p>Every device they are signed in on has to sign in again (an open page notices within a minute).</p>
        ) : (
          <p>
            The e-mail goes to {pending?.user.email}, with a link to choose a new password. Their current password keeps working until they
            do.
          </p>
        )}
      </ConfirmDialog>
    </>
  );
}
