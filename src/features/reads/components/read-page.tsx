import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { useLocation, useNavigation, useSearchParams } from "react-router";
// The live preview while the dial is dragged is computed in the browser with the physics engine itself (about a
// millisecond a read), so the line follows the finger at 60 fps; the answer the page commits to always comes from
// POST /api/reads/solve through TanStack Query once the dial is let go or typing pauses. The engine is fetched the
// first time the dial moves, not with the page (issue 18: the first page loads only what it shows).
import type { solveRead as SolveRead } from "#physics/solve-read";
import type { ReadRequest, ReadResponse } from "#shared/schemas/reads";
import type { UnitSystem } from "#shared/units";
import { Alert, Button, ButtonLink, Card, CopyLinkButton, PageHeader, PageSpinner, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useSolveRead } from "../api/solve-read";
import { useUnits } from "../../auth/hooks/use-units";
import { cannotStopWords } from "../utils/answer-text";
import { maxStoppableSlopeOf } from "#shared/errors";
import { formFieldForApi, type NumericField } from "../utils/read-form";
import { decodeReadQuery, encodeReadQuery, isCompleteReadQuery, toReadRequest, type ReadValues } from "../../../lib/read-url";
import { DrawnPart } from "../../../lib/drawn-part";
import { AnswerBar } from "./answer-bar";
import { ReadAnswer } from "./read-answer";
import { ReadForm } from "./read-form";
import { SavedReadsList } from "./saved-reads-list";
import { SaveReadPanel } from "./save-read-panel";
import { UnitsSwitch } from "./units-switch";

let engine: Promise<typeof SolveRead> | null = null;
const loadEngine = () => (engine ??= import("#physics/solve-read").then((m) => m.solveRead));

function previewRead(solve: typeof SolveRead | null, values: ReadValues | null): ReadResponse | null {
  if (!solve || !values) return null;
  const request = toReadRequest(values);
  if (!request) return null;
  const result = solve(request);
  return result.ok ? result.read : null;
}

/** A signed-in player's panel gets a card; a signed-out visitor's invitation is one line, like the one to save reads. */
function BesideRead({ signedIn, children }: { signedIn: boolean; children: ReactNode }) {
  return signedIn ? <Card>{children}</Card> : <div>{children}</div>;
}

/** What a panel beside the read (the route module's slot) gets to work with; the reads feature knows nothing else of it. */
export type ReadSlotContext = {
  /** The committed read (debounced: after a pause in typing or when the dial is let go); null while invalid. */
  request: ReadRequest | null;
  /** The read under the finger while the dial is dragged, else null. */
  liveRequest: ReadRequest | null;
  /** The line of the read shown (live or committed), putt frame. */
  line: ReadonlyArray<readonly [number, number]> | null;
  units: UnitSystem;
  signedIn: boolean;
  /** Sign in, then back to this read. */
  signInHref: string;
  /** Sets the form's pace to this roll-past (and commits it). */
  applyRollPast: (rollPastM: number) => void;
};

export type ReadPageProps = {
  /** A panel under the answer, e.g. the player's own make probability (composed by src/app/routes/read.tsx). */
  besideRead?: (context: ReadSlotContext) => ReactNode;
};

export function ReadPage({ besideRead }: ReadPageProps = {}) {
  const { units, setUnits, ready, saving, signedIn } = useUnits();
  const [params, setParams] = useSearchParams();
  const query = params.toString();
  const values = useMemo(() => decodeReadQuery(new URLSearchParams(query), units), [query, units]);
  const request = useMemo(() => toReadRequest(values), [values]);
  const solve = useSolveRead(request);
  const [liveValues, setLiveValues] = useState<ReadValues | null>(null);
  const [formProblems, setFormProblems] = useState<string[] | null>(null);
  const [solveInBrowser, setSolveInBrowser] = useState<typeof SolveRead | null>(null);
  const dragging = liveValues !== null;
  useEffect(() => {
    if (dragging && !solveInBrowser) void loadEngine().then((solve) => setSolveInBrowser(() => solve));
  }, [dragging, solveInBrowser]);
  const live = useMemo(() => previewRead(solveInBrowser, liveValues), [solveInBrowser, liveValues]);
  const liveRequest = useMemo(() => (liveValues ? toReadRequest(liveValues) : null), [liveValues]);

  // The read's values live in the address. Writing it is a navigation, and a navigation replaces one in progress: so
  // what the form commits is not written while a link to another page is being followed (its code still loading),
  // nor when the address already says it (the dial's arrow keys commit at once and then again after the typing pause).
  const { pathname } = useLocation();
  const navigation = useNavigation();
  const latest = useRef({ query, leaving: false });
  useLayoutEffect(() => {
    latest.current = { query, leaving: navigation.state !== "idle" && navigation.location.pathname !== pathname };
  });
  const writeAddress = useCallback(
    (next: ReadValues) => {
      const encoded = encodeReadQuery(next);
      if (latest.current.leaving || encoded === latest.current.query) return;
      setParams(encoded, { replace: true });
    },
    [setParams],
  );

  // A bare /read (or a partial link) gets every value written into the address, so it can be shared as it is. Into
  // the browser's address only, keeping the history entry's state: the values on the page come from the router's
  // query and are the same either way, and a router navigation would render the whole page again just as a drawn
  // /read finishes hydrating (≈ 20 ms, a long task on a phone; issue 18). The next value the player commits is a
  // router navigation as usual. Never once the browser's address has moved on to another page (a link followed
  // while this page was still showing).
  useEffect(() => {
    if (!ready || isCompleteReadQuery(new URLSearchParams(query)) || window.location.pathname !== pathname) return;
    const address = new URL(window.location.href);
    address.search = encodeReadQuery(values);
    window.history.replaceState(window.history.state, "", address);
  }, [ready, query, values, pathname]);

  // A button the player pressed (a roll past suggested beside the read): written at once.
  const applyRollPast = useCallback(
    (rollPastM: number) =>
      setParams(encodeReadQuery({ ...values, paceMode: "rollPast", rollPastM }), { replace: true, preventScrollReset: true }),
    [values, setParams],
  );

  if (!ready) return <PageSpinner label="Getting the read calculator ready" />;

  const error = solve.error;
  const cannotStop = isApiError(error) && error.status === 422;
  const serverErrors: Partial<Record<NumericField, string>> = {};
  if (isApiError(error) && error.status === 400) {
    for (const [key, why] of Object.entries(error.fields)) {
      const field = formFieldForApi(key);
      if (field) serverErrors[field] = why;
    }
  }
  const unplacedError = error && !cannotStop && Object.keys(serverErrors).length === 0 ? error : null;
  const steepest = cannotStop && isApiError(error) ? maxStoppableSlopeOf(error.body) : undefined;
  const shownRead = live ?? solve.data;
  // The form holds a value that cannot be read (slope 9 %), or the server refused one: the answer on screen is for
  // the last putt that could be read, so it is greyed out and the reason given.
  const staleBecause = live
    ? null
    : (formProblems ??
      (!request ? ["Fix the values marked in the form."] : Object.keys(serverErrors).length > 0 ? Object.values(serverErrors) : null));
  const encoded = encodeReadQuery(values);

  return (
    <>
      <title>Read a putt · Borrowline</title>
      <PageHeader
        eyebrow="Read a putt"
        title="Where to start it, and how firmly"
        description="Give the distance, the slope, which way the green falls and its speed."
        actions={<UnitsSwitch value={units} onChange={setUnits} saving={saving} />}
      />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <Card>
          <DrawnPart>
            <ReadForm
              units={units}
              values={values}
              onCommit={writeAddress}
              onLive={setLiveValues}
              serverErrors={serverErrors}
              slopeNote={steepest !== undefined ? `Steepest a ball stops on at this Stimp: ${steepest.toFixed(1)} %` : undefined}
              solving={solve.isFetching}
              onProblems={setFormProblems}
            />
          </DrawnPart>
        </Card>

        <div className="flex flex-col gap-6 lg:sticky lg:top-20">
          <Card id="answer">
            <DrawnPart>
              {cannotStop && !live ? (
                <div className="flex flex-col gap-3">
                  <h2 className="text-sm font-semibold tracking-wide text-coral-700 uppercase">The read</h2>
                  <Alert tone="warning" title="This ball would not stop">
                    {cannotStopWords(values.slopePct, values.stimpFt, steepest)} Try a gentler slope or a slower green.
                  </Alert>
                </div>
              ) : unplacedError && !live ? (
                <Alert
                  tone="error"
                  title="Could not work out the read"
                  action={
                    <Button size="sm" variant="secondary" onClick={() => void solve.refetch()}>
                      Try again
                    </Button>
                  }
                >
                  {unplacedError.message}
                </Alert>
              ) : shownRead ? (
                <ReadAnswer
                  read={shownRead}
                  distanceM={live && liveValues ? liveValues.distanceM : values.distanceM}
                  fallLineDeg={live && liveValues ? liveValues.fallLineDeg : values.fallLineDeg}
                  units={units}
                  state={live ? "live" : staleBecause ? "stale" : solve.isPlaceholderData ? "updating" : "fresh"}
                  staleBecause={staleBecause ?? undefined}
                />
              ) : !request ? (
                <p className="text-ink-600">Fix the values marked in the form and the read appears here.</p>
              ) : (
                <PageSpinner label="Working out the read" />
              )}
              <div className="mt-5 flex flex-wrap items-center gap-2 border-t border-ink-900/10 pt-4 print:hidden">
                {cannotStop ? null : (
                  <ButtonLink to={paths.rehearse.href(encoded)} variant="accent" size="sm">
                    Rehearse this putt
                  </ButtonLink>
                )}
                <ButtonLink to={paths.breakChart.href(encoded)} variant="secondary" size="sm">
                  Break chart for this green
                </ButtonLink>
                <CopyLinkButton
                  link={() => window.location.href}
                  linkName="the link to this read"
                  label="Copy link to this read"
                  variant="ghost"
                />
              </div>
            </DrawnPart>
          </Card>

          {besideRead ? (
            <BesideRead signedIn={signedIn}>
              {besideRead({
                request,
                liveRequest,
                line: shownRead?.path ?? null,
                units,
                signedIn,
                signInHref: paths.signIn.href(`${paths.read.path}?${encoded}`),
                applyRollPast,
              })}
            </BesideRead>
          ) : null}

          {signedIn ? (
            <Card>
              {request && !cannotStop ? (
                <SaveReadPanel request={request} />
              ) : (
                <p className="text-ink-600">A read that works out can be saved.</p>
              )}
            </Card>
          ) : (
            <p className="text-sm text-ink-600">
              <TextLink to={paths.signIn.href(`${paths.read.path}?${encoded}`)}>Sign in</TextLink> to save reads for the course or the
              practice green.
            </p>
          )}
        </div>
      </div>

      {signedIn ? (
        <Card className="mt-6">
          <SavedReadsList units={units} />
        </Card>
      ) : null}
      <div className="h-20 lg:hidden print:hidden" aria-hidden="true" />
      <AnswerBar read={shownRead} cannotStop={cannotStop && !live} units={units} targetId="answer" />
    </>
  );
}
