import { formatDate } from "#shared/format";
import { toast } from "../../../lib/toast";
import { Alert, Card, CardTitle, Spinner } from "../../../components/ui";
import { useLeaveSquad } from "../api/leave-squad";
import { useMySquads } from "../api/get-squads";
import { ConfirmAction } from "./confirm-action";

/** The squads a player belongs to, with a way out of each. */
export function MySquads() {
  const squads = useMySquads();
  const leave = useLeaveSquad();
  return (
    <Card>
      <CardTitle>My squads</CardTitle>
      {squads.isPending ? (
        <div className="py-4">
          <Spinner label="Loading your squads" />
        </div>
      ) : squads.isError ? (
        <Alert tone="error" className="mt-3">
          {squads.error.message}
        </Alert>
      ) : squads.data.squads.length === 0 ? (
        <p className="mt-2 text-ink-500">You are not in a squad. When a coach invites you, open the link in their e-mail to join.</p>
      ) : (
        <ul className="mt-3 divide-y divide-ink-900/10">
          {squads.data.squads.map((s) => (
            <li key={s.id} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
              <div className="min-w-0">
                <p className="font-semibold text-ink-900">{s.name}</p>
                <p className="text-sm text-ink-500">
                  Coach {s.coach.name} · {s.counts.members} player{s.counts.members === 1 ? "" : "s"} · joined {formatDate(s.joinedAt)}
                </p>
              </div>
              <ConfirmAction
                label="Leave"
                ariaLabel={`Leave ${s.name}`}
                question={`Leave ${s.name}? ${s.coach.name} will no longer see your practice.`}
                confirmLabel="Yes, leave"
                pendingLabel="Leaving…"
                pending={leave.isPending && leave.variables === s.id}
                onConfirm={() => leave.mutate(s.id, { onSuccess: () => toast.success(`You left ${s.name}.`) })}
              />
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
