import { PageHeader } from "../../../components/ui";
import { RequireAuth } from "../../../features/auth/components/require-auth";
import { MySquads } from "../../../features/coaching/components/my-squads";
import { SquadsPage } from "../../../features/coaching/components/squads-page";

// Coaches manage their squads here; a player sees the squads they belong to.
export function SquadsRoute() {
  return (
    <>
      <title>Squads · Borrowline</title>
      <RequireAuth>
        {(me) =>
          me.user.role === "player" ? (
            <>
              <PageHeader
                eyebrow="Practice"
                title="My squads"
                description="The coaches you work with. They can give you ladders and see your practice."
              />
              <div className="max-w-2xl">
                <MySquads />
              </div>
            </>
          ) : (
            <SquadsPage viewerId={me.user.id} />
          )
        }
      </RequireAuth>
    </>
  );
}

export { SquadsRoute as Component };
