import { useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import type { Ladder } from "#shared/schemas/ladders";
import { Button, ButtonLink, EmptyState, PageHeader, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useCopyLadder } from "../api/copy-ladder";
import { useMe } from "../../auth/api/get-me";
import { useDeleteLadder } from "../api/delete-ladder";
import { splitByOwner } from "../utils/by-owner";
import { useLadders } from "../api/get-ladders";
import { useUnits } from "../../auth/hooks/use-units";
import { FAIL_RULE_WORDS, ladderSpan } from "../utils/rule-words";
import { ConfirmAction } from "./confirm-action";
import { QueryState } from "./query-state";
import { Badge } from "./status-badge";

function LadderCard({ ladder, showOwner = false }: { ladder: Ladder; showOwner?: boolean }) {
  const { units } = useUnits();
  const navigate = useNavigate();
  const copy = useCopyLadder();
  const remove = useDeleteLadder();
  const doCopy = () =>
    copy.mutate(
      { id: ladder.id },
      {
        onSuccess: async (made) => {
          toast.success(`${made.name} is now in your library.`);
          await navigate(paths.ladderEdit.href(made.id));
        },
      },
    );
  return (
    <li className="flex flex-col gap-3 rounded-(--radius-card) bg-sand-50 p-5 shadow-(--shadow-card) ring-1 ring-ink-900/5">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <TextLink to={paths.ladder.href(ladder.id)} className="text-lg font-semibold tracking-tight">
          {ladder.name}
        </TextLink>
        {ladder.builtIn ? <Badge tone="accent">Borrowline ladder</Badge> : null}
        {showOwner && ladder.ownerName ? <Badge tone="neutral">{`Owner: ${ladder.ownerName}`}</Badge> : null}
      </div>
      {ladder.description ? <p className="line-clamp-3 text-ink-600">{ladder.description}</p> : null}
      <p className="text-sm text-ink-500">
        {ladderSpan(ladder.rungs, units)} · missed rung: {FAIL_RULE_WORDS[ladder.failRule].label.toLowerCase()}
      </p>
      <div className="mt-auto flex flex-wrap gap-2 pt-1">
        <ButtonLink to={paths.ladder.href(ladder.id)} size="sm" aria-label={`Give ${ladder.name} to players`}>
          Give to players
        </ButtonLink>
        {ladder.builtIn ? (
          <Button
            size="sm"
            variant="secondary"
            loading={copy.isPending}
            loadingText="Copying…"
            onClick={doCopy}
            aria-label={`Copy ${ladder.name} to my ladders`}
          >
            Copy to my ladders
          </Button>
        ) : (
          <>
            <ButtonLink to={paths.ladderEdit.href(ladder.id)} size="sm" variant="secondary" aria-label={`Edit ${ladder.name}`}>
              Edit
            </ButtonLink>
            <Button
              size="sm"
              variant="ghost"
              loading={copy.isPending}
              loadingText="Copying…"
              onClick={doCopy}
              aria-label={`Copy ${ladder.name}`}
            >
              Copy
            </Button>
            <ConfirmAction
              label="Delete"
              ariaLabel={showOwner && ladder.ownerName ? `Delete ${ladder.name}, ${ladder.ownerName}'s ladder` : `Delete ${ladder.name}`}
              question="Players who have it keep their copy."
              confirmLabel="Yes, delete"
              pendingLabel="Deleting…"
              pending={remove.isPending}
              onConfirm={() => remove.mutate(ladder.id, { onSuccess: () => toast.success(`${ladder.name} was deleted.`) })}
            />
          </>
        )}
      </div>
    </li>
  );
}

/** The coach's ladder library, and Borrowline's own ladders to give as they are or to copy. */
export function LaddersPage() {
  const ladders = useLadders();
  const me = useMe();
  const viewerId = me.data?.user.id ?? "";
  return (
    <>
      <PageHeader
        eyebrow="Coaching"
        title="Ladders"
        description="Graded stations from short to long, each with a pass rule. Build your own or start from one of ours."
        actions={<ButtonLink to={paths.ladderNew.href()}>New ladder</ButtonLink>}
      />
      <QueryState query={ladders} label="Loading ladders">
        {() => {
          const { own, others } = splitByOwner(
            ladders.data!.ladders.filter((l) => !l.builtIn),
            viewerId,
            (l) => l.ownerId,
          );
          const ours = ladders.data!.ladders.filter((l) => l.builtIn);
          return (
            <div className="flex flex-col gap-10">
              <section aria-labelledby="own-ladders">
                <h2 id="own-ladders" className="mb-3 text-xl font-semibold tracking-tight">
                  Your ladders
                </h2>
                {own.length === 0 ? (
                  <EmptyState
                    title="No ladders of your own yet"
                    action={<ButtonLink to={paths.ladderNew.href()}>Build a ladder</ButtonLink>}
                  >
                    Build one from scratch, or copy one of the Borrowline ladders below and change it.
                  </EmptyState>
                ) : (
                  <ul className="grid gap-4 md:grid-cols-2">
                    {own.map((l) => (
                      <LadderCard key={l.id} ladder={l} />
                    ))}
                  </ul>
                )}
              </section>
              {others.length > 0 ? (
                <section aria-labelledby="other-ladders">
                  <h2 id="other-ladders" className="text-xl font-semibold tracking-tight">
                    Other coaches’ ladders
                  </h2>
                  <p className="mb-3 text-ink-500">You see these as an admin. Each belongs to the coach named on it.</p>
                  <ul className="grid gap-4 md:grid-cols-2">
                    {others.map((l) => (
                      <LadderCard key={l.id} ladder={l} showOwner />
                    ))}
                  </ul>
                </section>
              ) : null}
              <section aria-labelledby="our-ladders">
                <h2 id="our-ladders" className="text-xl font-semibold tracking-tight">
                  Borrowline ladders
                </h2>
                <p className="mb-3 text-ink-500">Made by us. Give them as they are, or copy one to change it.</p>
                <ul className="grid gap-4 md:grid-cols-2">
                  {ours.map((l) => (
                    <LadderCard key={l.id} ladder={l} />
                  ))}
                </ul>
              </section>
            </div>
          );
        }}
      </QueryState>
    </>
  );
}
