import { useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import type { Ladder } from "#shared/schemas/ladders";
import { Button, ButtonLink, PageHeader, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useCopyLadder } from "../api/copy-ladder";
import { useLadder } from "../api/get-ladder";
import { useUnits } from "../../auth/hooks/use-units";
import { ladderSpan } from "../utils/rule-words";
import { AssignPanel } from "./assign-panel";
import { LadderPreview } from "./ladder-preview";
import { QueryState } from "./query-state";
import { Badge } from "./status-badge";

function LadderView({ ladder }: { ladder: Ladder }) {
  const { units } = useUnits();
  const copy = useCopyLadder();
  const navigate = useNavigate();
  return (
    <>
      <title>{`${ladder.name} · Borrowline`}</title>
      <PageHeader
        eyebrow={<TextLink to={paths.ladders.href()}>Ladders</TextLink>}
        title={ladder.name}
        description={ladderSpan(ladder.rungs, units)}
        actions={
          ladder.builtIn ? (
            <>
              <Badge tone="accent" className="self-center">
                Borrowline ladder
              </Badge>
              <Button
                size="sm"
                variant="secondary"
                loading={copy.isPending}
                loadingText="Copying…"
                onClick={() =>
                  copy.mutate(
                    { id: ladder.id },
                    {
                      onSuccess: async (made) => {
                        toast.success(`${made.name} is now in your library.`);
                        await navigate(paths.ladderEdit.href(made.id));
                      },
                    },
                  )
                }
              >
                Copy to change it
              </Button>
            </>
          ) : (
            <ButtonLink to={paths.ladderEdit.href(ladder.id)} size="sm" variant="secondary">
              Edit ladder
            </ButtonLink>
          )
        }
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_1.1fr]">
        <LadderPreview name={ladder.name} description={ladder.description} failRule={ladder.failRule} rungs={ladder.rungs} units={units} />
        <AssignPanel ladder={ladder} />
      </div>
    </>
  );
}

/** One ladder: the player's view of it and the form to give it to players. */
export function LadderPage({ ladderId }: { ladderId: string }) {
  const ladder = useLadder(ladderId);
  return (
    <QueryState query={ladder} label="Loading the ladder">
      {() => <LadderView ladder={ladder.data!} />}
    </QueryState>
  );
}
