import { formatDate } from "#shared/format";
import { useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import type { InvitationPreview } from "#shared/schemas/squads";
import { Alert, Button, ButtonLink, Card, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { authClient } from "../../../lib/auth-client";
import { useMe, type Me } from "../../auth/api/get-me";
import { authKeys } from "../../auth/api/keys";
import { SignUpForm } from "../../auth/components/sign-up-form";
import { useAcceptInvitation } from "../api/accept-invitation";
import { useInvitationPreview } from "../api/get-invitation-preview";

/** Signs out here without leaving the page, so the link can be used with another account. */
function useSignOutHere() {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState(false);
  const signOut = async () => {
    setPending(true);
    try {
      await authClient.signOut();
      queryClient.setQueryData(authKeys.me(), null);
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] && q.queryKey[1] !== "invitation-preview" });
    } finally {
      setPending(false);
    }
  };
  return { signOut, pending };
}

function InvitationCard({ preview }: { preview: InvitationPreview }) {
  return (
    <Card tone="ink" className="mb-6">
      <p className="text-sm font-semibold tracking-wide text-coral-300 uppercase">Squad invitation</p>
      <h1 className="mt-1 text-3xl font-semibold tracking-tight">{preview.squad.name}</h1>
      <dl className="mt-4 grid gap-3 text-sand-200 sm:grid-cols-2">
        <div>
          <dt className="text-sm text-sand-300">Coach</dt>
          <dd className="text-lg font-medium text-sand-50">{preview.coach.name}</dd>
        </div>
        <div>
          <dt className="text-sm text-sand-300">Invitation for</dt>
          <dd className="text-lg font-medium break-all text-sand-50">{preview.email}</dd>
        </div>
      </dl>
      <p className="mt-4 text-sand-200">
        In a squad you run the putting ladders {preview.coach.name} sets, and they can see your practice and progress. You can leave a squad
        at any time.
      </p>
    </Card>
  );
}

function Closed({ preview, me }: { preview: InvitationPreview; me: Me | null | undefined }) {
  const copy = {
    accepted: {
      title: "This invitation has already been used",
      body: "Each link works once. If you accepted it, the squad is on your ladders page.",
    },
    expired: { title: "This invitation has expired", body: `Links work for 14 days. Ask ${preview.coach.name} to send you a new one.` },
    revoked: {
      title: "This invitation was withdrawn",
      body: `${preview.coach.name} withdrew this link. If you still want to join, ask them for a new invitation.`,
    },
    pending: { title: "", body: "" },
  }[preview.status];
  return (
    <Alert tone="warning" title={copy.title}>
      <p>{copy.body}</p>
      {me?.user.role === "player" ? (
        <p className="mt-2">
          <ButtonLink to={paths.myLadders.href()} size="sm" variant="secondary">
            Go to my ladders
          </ButtonLink>
        </p>
      ) : null}
    </Alert>
  );
}

function SignedOut({ token, preview, onSignedUp }: { token: string; preview: InvitationPreview; onSignedUp: () => void }) {
  const [creating, setCreating] = useState(false);
  if (creating) {
    return (
      <Card>
        <h2 className="text-xl font-semibold tracking-tight">Create your player account</h2>
        <p className="mt-1 mb-6 text-ink-500">
          Use the invited e-mail so the invitation matches your account. Then confirm the address with the link we e-mail you: it brings you
          back here to join {preview.squad.name}.
        </p>
        <SignUpForm defaultEmail={preview.email} role="player" onSignedUp={onSignedUp} callbackURL={paths.join.href(token)} />
        <Button variant="ghost" className="mt-3" onClick={() => setCreating(false)}>
          Back
        </Button>
      </Card>
    );
  }
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <Button size="lg" onClick={() => setCreating(true)}>
        Create your player account
      </Button>
      <ButtonLink size="lg" variant="secondary" to={paths.signIn.href(paths.join.href(token))}>
        I already have an account — sign in
      </ButtonLink>
    </div>
  );
}

/** The page an invitation e-mail links to: who invites whom, then the way in and the join itself. */
export function JoinPage({ token }: { token: string }) {
  const preview = useInvitationPreview(token);
  const me = useMe();
  const accept = useAcceptInvitation();
  const { signOut, pending: signingOut } = useSignOutHere();

  if (preview.isPending) return <PageSpinner label="Opening the invitation" />;
  if (preview.isError) {
    const bad = isApiError(preview.error) && (preview.error.status === 404 || preview.error.status === 400);
    return (
      <div className="mx-auto max-w-xl">
        <title>Invitation · Borrowline</title>
        <Alert tone="error" title={bad ? "This invitation link does not work" : "Could not open the invitation"}>
          {bad ? "The link may be incomplete: open it again from the e-mail, or ask your coach to send a new one." : preview.error.message}
        </Alert>
      </div>
    );
  }

  const p = preview.data;
  const user = me.data?.user;
  const joined = accept.data;

  let body;
  if (joined) {
    body = (
      <Alert tone="success" title={`You are in ${joined.squad.name}`}>
        <p>{joined.squad.coach.name} can now give you ladders. They will show on your ladders page, and you get an e-mail for each one.</p>
        <p className="mt-3">
          <ButtonLink to={paths.myLadders.href()} size="sm">
            Go to my ladders
          </ButtonLink>
        </p>
      </Alert>
    );
  } else if (p.status !== "pending") {
    body = <Closed preview={p} me={me.data} />;
  } else if (me.isPending) {
    body = <PageSpinner label="Checking your account" />;
  } else if (!user) {
    // After sign-up the page shows the signed-in state: the e-mail must be confirmed before joining.
    body = <SignedOut token={token} preview={p} onSignedUp={() => undefined} />;
  } else if (user.role !== "player") {
    body = (
      <Alert tone="warning" title={`You are signed in as a ${user.role}`}>
        <p>Only player accounts can join a squad. Sign out, then create or use the player account for {p.email}.</p>
        <Button size="sm" variant="secondary" className="mt-3" loading={signingOut} onClick={() => void signOut()}>
          Sign out
        </Button>
      </Alert>
    );
  } else if (user.email.toLowerCase() !== p.email.toLowerCase()) {
    body = (
      <Alert tone="warning" title="This invitation is for another e-mail">
        <p>
          It was sent to <strong className="break-all">{p.email}</strong>, and you are signed in as{" "}
          <strong className="break-all">{user.email}</strong>. Sign out and use the account for {p.email}, or ask {p.coach.name} to invite{" "}
          {user.email} instead.
        </p>
        <Button size="sm" variant="secondary" className="mt-3" loading={signingOut} onClick={() => void signOut()}>
          Sign out
        </Button>
      </Alert>
    );
  } else {
    body = (
      <div className="flex flex-col gap-3">
        <p className="text-ink-600">
          Signed in as <strong>{user.email}</strong>.
        </p>
        {!user.emailVerified && !p.provesAddress ? (
          <Alert tone="info" title="Confirm your e-mail first">
            Open the link we sent to <strong className="break-all">{user.email}</strong>: it confirms the address and brings you back here.
            Joining needs a confirmed e-mail, so that only the person who reads that inbox can use the invitation.
          </Alert>
        ) : null}
        <Button size="lg" loading={accept.isPending} loadingText="Joining…" onClick={() => accept.mutate(token)} className="sm:self-start">
          Join {p.squad.name}
        </Button>
      </div>
    );
  }

  return (
    <div className="mx-auto max-w-2xl">
      <title>{`Join ${p.squad.name} · Borrowline`}</title>
      <InvitationCard preview={p} />
      {accept.isError && !joined ? (
        <Alert tone="error" title="Could not join" className="mb-4">
          {accept.error.message}
        </Alert>
      ) : null}
      {body}
      {p.status === "pending" && !joined ? (
        <p className="mt-6 text-sm text-ink-500">The link works once, until {formatDate(p.expiresAt)}.</p>
      ) : null}
    </div>
  );
}
