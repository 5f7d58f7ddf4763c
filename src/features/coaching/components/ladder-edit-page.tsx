import { ButtonLink, PageHeader, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useLadder } from "../api/get-ladder";
import { useUnits } from "../../auth/hooks/use-units";
import { LadderBuilder } from "./ladder-builder";
import { QueryState } from "./query-state";

/** The builder for a new ladder or one of the coach's own; a Borrowline ladder must be copied first. */
export function LadderEditPage({ ladderId }: { ladderId?: string }) {
  const { units } = useUnits();
  const ladder = useLadder(ladderId);
  if (!ladderId) {
    return (
      <>
        <title>New ladder · Borrowline</title>
        <PageHeader
          eyebrow={<TextLink to={paths.ladders.href()}>Ladders</TextLink>}
          title="New ladder"
          description="Set the rungs from short to long; the preview shows what your players will read."
        />
        <LadderBuilder units={units} />
      </>
    );
  }
  return (
    <QueryState query={ladder} label="Loading the ladder">
      {() =>
        ladder.data!.builtIn ? (
          <PageHeader
            title={ladder.data!.name}
            description="Borrowline ladders cannot be changed. Copy it from its page to make a version of your own."
            actions={<ButtonLink to={paths.ladder.href(ladderId)}>Open the ladder</ButtonLink>}
          />
        ) : (
          <>
            <title>{`Edit ${ladder.data!.name} · Borrowline`}</title>
            <PageHeader
              eyebrow={<TextLink to={paths.ladders.href()}>Ladders</TextLink>}
              title={`Edit ${ladder.data!.name}`}
              description="Players who already have this ladder keep the copy they were given."
            />
            <LadderBuilder units={units} ladder={ladder.data!} />
          </>
        )
      }
    </QueryState>
  );
}
