import { Link, useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import type { Squad } from "#shared/schemas/squads";
import { Card, CardTitle, EmptyState, PageHeader } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useCreateSquad } from "../api/create-squad";
import { useCoachSquads } from "../api/get-squads";
import { splitByOwner } from "../utils/by-owner";
import { QueryState } from "./query-state";
import { SquadForm } from "./squad-form";

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function SquadCard({ squad, showCoach = false }: { squad: Squad; showCoach?: boolean }) {
  return (
    <li>
      <Link
        to={paths.squad.href(squad.id)}
        className="flex h-full flex-col gap-2 rounded-(--radius-card) bg-sand-50 p-5 shadow-(--shadow-card) ring-1 ring-ink-900/5 transition hover:ring-ink-900/20 focus-visible:outline-3 focus-visible:outline-coral-500"
      >
        <span className="text-lg font-semibold tracking-tight text-ink-900">{squad.name}</span>
        {showCoach ? <span className="text-sm font-medium text-coral-700">Coach: {squad.coach.name}</span> : null}
        {squad.description ? <span className="text-ink-600">{squad.description}</span> : null}
        <span className="mt-auto flex flex-wrap gap-x-4 gap-y-1 pt-2 text-sm text-ink-500">
          <span>{plural(squad.counts.members, "player")}</span>
          {squad.counts.pendingInvitations > 0 ? <span>{plural(squad.counts.pendingInvitations, "invitation")} waiting</span> : null}
          <span>{plural(squad.counts.assignments, "ladder")} given</span>
        </span>
      </Link>
    </li>
  );
}

/** The coach's squads and a form for a new one; an admin also sees every other coach's, labelled with their coach. */
export function SquadsPage({ viewerId }: { viewerId: string }) {
  const squads = useCoachSquads();
  const create = useCreateSquad();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        eyebrow="Coaching"
        title="Squads"
        description="The players you coach. Invite them by e-mail; once they join, you can give them ladders and follow their progress."
      />
      <div className="grid gap-6 lg:grid-cols-[1.6fr_1fr]">
        <section aria-labelledby="squads-list-title">
          <QueryState query={squads} label="Loading your squads">
            {() => {
              const { own, others } = splitByOwner(squads.data!.squads, viewerId, (sq) => sq.coach.id);
              return (
                <div className="flex flex-col gap-8">
                  <div>
                    <h2 id="squads-list-title" className={others.length > 0 ? "mb-3 text-xl font-semibold tracking-tight" : "sr-only"}>
                      Your squads
                    </h2>
                    {own.length === 0 ? (
                      <EmptyState title="No squads yet">
                        Create your first squad with the form, then invite your players by e-mail.
                      </EmptyState>
                    ) : (
                      <ul className="grid gap-4 sm:grid-cols-2">
                        {own.map((sq) => (
                          <SquadCard key={sq.id} squad={sq} />
                        ))}
                      </ul>
                    )}
                  </div>
                  {others.length > 0 ? (
                    <div>
                      <h2 className="text-xl font-semibold tracking-tight">Other coaches’ squads</h2>
                      <p className="mb-3 text-ink-500">You see these as an admin. Each belongs to the coach named on it.</p>
                      <ul className="grid gap-4 sm:grid-cols-2">
                        {others.map((sq) => (
                          <SquadCard key={sq.id} squad={sq} showCoach />
                        ))}
                      </ul>
                    </div>
                  ) : null}
                </div>
              );
            }}
          </QueryState>
        </section>
        <Card className="self-start">
          <CardTitle>New squad</CardTitle>
          <div className="mt-4">
            <SquadForm
              submitLabel="Create squad"
              pendingLabel="Creating…"
              onSubmit={async (input) => {
                const squad = await create.mutateAsync(input);
                toast.success(`${squad.name} is ready. Invite its players next.`);
                await navigate(paths.squad.href(squad.id));
              }}
            />
          </div>
        </Card>
      </div>
    </>
  );
}
