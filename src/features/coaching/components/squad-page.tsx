import { formatDate } from "#shared/format";
import { useState } from "react";
import { useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import type { Invitation, InvitationStatus, Squad } from "#shared/schemas/squads";
import {
  Alert,
  Button,
  ButtonLink,
  Card,
  CardTitle,
  CopyLinkButton,
  EmptyState,
  PageHeader,
  Spinner,
  TextLink,
} from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useDeleteSquad } from "../api/delete-squad";
import { useInvitations } from "../api/get-invitations";
import { useSquad } from "../api/get-squad";
import { useRemoveMember } from "../api/remove-member";
import { useResendInvitation } from "../api/resend-invitation";
import { useRevokeInvitation } from "../api/revoke-invitation";
import { useUpdateSquad } from "../api/update-squad";
import { ConfirmAction } from "./confirm-action";
import { InviteForm } from "./invite-form";
import { QueryState } from "./query-state";
import { SquadForm } from "./squad-form";
import { SquadOverviewSection } from "./squad-overview";
import { Badge, type BadgeTone } from "./status-badge";

const day = (iso: string) => formatDate(iso);

const INVITATION_STATUS: Record<InvitationStatus, { label: string; tone: BadgeTone }> = {
  pending: { label: "Waiting", tone: "warn" },
  accepted: { label: "Joined", tone: "ok" },
  expired: { label: "Expired", tone: "neutral" },
  revoked: { label: "Withdrawn", tone: "neutral" },
};

function MembersSection({ squad }: { squad: Squad }) {
  const remove = useRemoveMember();
  return (
    <Card>
      <CardTitle>Players ({squad.members.length})</CardTitle>
      {squad.members.length === 0 ? (
        <p className="mt-2 text-ink-500">Nobody has joined yet. Players appear here once they open their invitation and accept it.</p>
      ) : (
        <ul className="mt-4 divide-y divide-ink-900/10">
          {squad.members.map((m) => (
            <li key={m.id} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
              <div className="min-w-0">
                <TextLink to={paths.coachPlayer.href(m.id)}>{m.name}</TextLink>
                <p className="text-sm break-all text-ink-500">
                  {m.email} · joined {day(m.joinedAt)}
                </p>
              </div>
              <ConfirmAction
                label="Remove"
                ariaLabel={`Remove ${m.name}`}
                question={`Remove ${m.name} from ${squad.name}? Their ladders and practice stay theirs.`}
                confirmLabel="Yes, remove"
                pendingLabel="Removing…"
                pending={remove.isPending && remove.variables?.playerId === m.id}
                onConfirm={() =>
                  remove.mutate(
                    { squadId: squad.id, playerId: m.id },
                    { onSuccess: () => toast.success(`${m.name} is no longer in ${squad.name}.`) },
                  )
                }
              />
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

function InvitationRow({ invitation, squadId }: { invitation: Invitation; squadId: string }) {
  const revoke = useRevokeInvitation();
  const resend = useResendInvitation();
  const status = INVITATION_STATUS[invitation.status];
  return (
    <li className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-medium break-all text-ink-900">{invitation.email}</span>
          <Badge tone={status.tone}>{status.label}</Badge>
        </p>
        <p className="text-sm text-ink-500">
          Sent {day(invitation.createdAt)}
          {invitation.status === "pending" ? ` · link works until ${day(invitation.expiresAt)}` : null}
          {invitation.status === "accepted" && invitation.acceptedAt ? ` · joined ${day(invitation.acceptedAt)}` : null}
        </p>
      </div>
      <div className="flex flex-wrap items-start gap-2">
        {invitation.status !== "accepted" ? (
          <Button
            size="sm"
            variant="secondary"
            aria-label={`Send the invitation to ${invitation.email} again`}
            pending={resend.isPending}
            onClick={() =>
              resend.mutate(
                { id: invitation.id, squadId },
                {
                  onSuccess: () => toast.success(`A new link went to ${invitation.email}; the old one no longer works.`),
                  onError: (e) => toast.error(e.message),
                },
              )
            }
          >
            {resend.isPending ? "Sending…" : "Resend"}
          </Button>
        ) : null}
        {resend.data ? <CopyLinkButton link={resend.data.link} linkName="the new invitation link" label="Copy the new link" /> : null}
        {invitation.status === "pending" ? (
          <ConfirmAction
            label="Withdraw"
            ariaLabel={`Withdraw the invitation to ${invitation.email}`}
            question="The link will stop working."
            confirmLabel="Yes, withdraw"
            pendingLabel="Withdrawing…"
            pending={revoke.isPending}
            onConfirm={() => revoke.mutate({ id: invitation.id, squadId })}
          />
        ) : null}
      </div>
    </li>
  );
}

function InvitationsSection({ squad }: { squad: Squad }) {
  const invitations = useInvitations(squad.id);
  const list = invitations.data?.invitations ?? [];
  return (
    <Card>
      <CardTitle>Invite players</CardTitle>
      <p className="mt-1 text-ink-500">
        Each address gets an e-mail with a link to join {squad.name}. New players create their account from the link.
      </p>
      <div className="mt-4">
        <InviteForm squadId={squad.id} squadName={squad.name} />
      </div>
      <h3 className="mt-8 font-semibold text-ink-900">Invitations sent</h3>
      {invitations.isPending ? (
        <div className="py-4">
          <Spinner label="Loading invitations" />
        </div>
      ) : invitations.isError ? (
        <Alert tone="error" className="mt-2">
          {invitations.error.message}
        </Alert>
      ) : list.length === 0 ? (
        <p className="mt-1 text-ink-500">None yet.</p>
      ) : (
        <ul className="mt-1 divide-y divide-ink-900/10">
          {list.map((inv) => (
            <InvitationRow key={inv.id} invitation={inv} squadId={squad.id} />
          ))}
        </ul>
      )}
    </Card>
  );
}

function SquadDetails({ squad }: { squad: Squad }) {
  const [editing, setEditing] = useState(false);
  const update = useUpdateSquad();
  const remove = useDeleteSquad();
  const navigate = useNavigate();
  return (
    <>
      <title>{`${squad.name} · Borrowline`}</title>
      <PageHeader
        eyebrow={<TextLink to={paths.squads.href()}>Squads</TextLink>}
        title={squad.name}
        description={squad.description ?? undefined}
        actions={
          editing ? null : (
            <>
              <ButtonLink to={`${paths.coach.href()}?squad=${encodeURIComponent(squad.id)}`} variant="secondary" size="sm">
                See progress
              </ButtonLink>
              <ButtonLink to={paths.ladders.href()} variant="secondary" size="sm">
                Give a ladder
              </ButtonLink>
              <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
                Edit
              </Button>
            </>
          )
        }
      />
      {editing ? (
        <Card className="mb-6 max-w-xl">
          <CardTitle>Edit squad</CardTitle>
          <div className="mt-4">
            <SquadForm
              defaultValues={{ name: squad.name, description: squad.description }}
              submitLabel="Save changes"
              pendingLabel="Saving…"
              onCancel={() => setEditing(false)}
              onSubmit={async (input) => {
                await update.mutateAsync({ id: squad.id, patch: { name: input.name, description: input.description ?? null } });
                setEditing(false);
                toast.success("Squad saved.");
              }}
            />
          </div>
        </Card>
      ) : null}
      <div className="mb-6">
        <SquadOverviewSection squadId={squad.id} squadName={squad.name} />
      </div>
      <div className="grid gap-6 lg:grid-cols-2">
        <MembersSection squad={squad} />
        <InvitationsSection squad={squad} />
      </div>
      <section aria-labelledby="danger-title" className="mt-10 flex flex-col gap-2 border-t border-ink-900/10 pt-6">
        <h2 id="danger-title" className="font-semibold text-ink-900">
          Delete this squad
        </h2>
        <p className="text-ink-500">
          Its members and invitations go with it. Ladders already given stay with the players, with their progress.
        </p>
        <div>
          <ConfirmAction
            label="Delete squad"
            variant="secondary"
            question={`Delete ${squad.name}?`}
            confirmLabel="Yes, delete"
            pendingLabel="Deleting…"
            pending={remove.isPending}
            onConfirm={() =>
              remove.mutate(squad.id, {
                onSuccess: async () => {
                  toast.success(`${squad.name} was deleted.`);
                  await navigate(paths.squads.href());
                },
              })
            }
          />
        </div>
      </section>
    </>
  );
}

/** One of the coach's squads: its players, invitations, edit and delete. */
export function SquadPage({ squadId }: { squadId: string }) {
  const squad = useSquad(squadId);
  if (squad.isError && squad.error && "status" in squad.error && squad.error.status === 404) {
    return (
      <EmptyState title="Squad not found">
        It may have been deleted, or it belongs to another coach. <TextLink to={paths.squads.href()}>Back to your squads</TextLink>
      </EmptyState>
    );
  }
  return (
    <QueryState query={squad} label="Loading the squad">
      {() => <SquadDetails squad={squad.data!} />}
    </QueryState>
  );
}
