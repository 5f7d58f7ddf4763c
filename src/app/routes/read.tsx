import { ReadPage } from "../../features/reads/components/read-page";
import { OddsPanel } from "../../features/make-probability/components/odds-panel";

// Features do not import each other: the route composes the read page with the player's own odds beside it.
export function ReadRoute() {
  return (
    <ReadPage
      besideRead={(ctx) => (
        <OddsPanel
          read={ctx.request}
          liveRead={ctx.liveRequest}
          line={ctx.line}
          units={ctx.units}
          signedIn={ctx.signedIn}
          signInHref={ctx.signInHref}
          onApplyRollPast={ctx.applyRollPast}
        />
      )}
    />
  );
}

export { ReadRoute as Component };
