import { Link } from "react-router";
import { ButtonLink, Card } from "../../components/ui";
import { BreakDiagram } from "../../components/illustrations/break-diagram";
import { paths } from "../../config/paths";
import { useMe } from "../../features/auth/api/get-me";
import { greeting } from "../../features/auth/utils/greeting";

const inputs = [
  { term: "Distance", detail: "ball to hole, in feet or metres" },
  { term: "Slope", detail: "how steep the green is, in percent" },
  { term: "Fall line", detail: "which way the green falls away" },
  { term: "Stimp", detail: "the green speed in feet" },
];

const pillars = [
  {
    title: "A read you can trust",
    body: "Where to start the ball, how far left or right of the hole that line passes, and how firmly to roll it — with the distance the putt plays like.",
  },
  {
    title: "Practice that shows where strokes go",
    body: "Log sessions putt by putt on the practice green. Make rates by distance show whether the work is paying off, against your own past and a tour baseline.",
  },
  {
    title: "Ladders for coaches",
    body: "Build graded stations from short to long with a pass rule for each, give them to the players in your squad, and follow how each one is getting on.",
  },
];

/** The calculator needs no account, so reading a putt is the first thing on offer to everyone. */
function Welcome() {
  const me = useMe();
  if (me.data) {
    const coach = me.data.user.role !== "player";
    return (
      <div className="flex flex-col gap-3 sm:flex-row">
        <ButtonLink to={paths.read.href()} variant="accent" size="lg">
          Read a putt
        </ButtonLink>
        <ButtonLink to={coach ? paths.coach.href() : paths.practice.href()} variant="on-dark" size="lg">
          {coach ? "Your squads" : "Log practice"}
        </ButtonLink>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <ButtonLink to={paths.read.href()} variant="accent" size="lg">
        Read a putt — no account needed
      </ButtonLink>
      <p className="text-sm text-sand-300">
        To log practice, see your make rates or coach a squad,{" "}
        <Link className="font-semibold text-sand-50 underline underline-offset-4" to={paths.signUp.href()}>
          create a free account
        </Link>{" "}
        or{" "}
        <Link className="font-semibold text-sand-50 underline underline-offset-4" to={paths.signIn.href()}>
          sign in
        </Link>
        .
      </p>
    </div>
  );
}

function Greeting() {
  const me = useMe();
  if (!me.data) return <p className="text-sm font-semibold tracking-wide text-coral-300 uppercase">Putting and green reading</p>;
  return (
    <p className="text-sm font-semibold tracking-wide text-coral-300 uppercase">{greeting(me.data.user.name, me.data.user.createdAt)}</p>
  );
}

export function HomeRoute() {
  return (
    <>
      <title>Borrowline — read the putt, then practise it</title>
      <section className="-mx-4 -mt-8 bg-ink-900 text-sand-50 sm:mx-0 sm:mt-0 sm:rounded-[1.75rem]">
        <div className="grid items-center gap-10 px-5 py-10 sm:px-10 sm:py-14 lg:grid-cols-[1.2fr_1fr] lg:gap-14 lg:px-14">
          <div className="flex flex-col gap-6">
            <Greeting />
            <h1 className="text-4xl leading-[1.1] font-semibold tracking-tight text-balance sm:text-5xl">
              Know where to start the ball, and how firmly to roll it.
            </h1>
            <p className="max-w-xl text-lg leading-relaxed text-sand-200">
              Most strokes on the green go to a wrong read, not a bad stroke. Tell Borrowline the putt in front of you and it works out the
              break for the pace you choose — because a ball that is dying at the hole curves far more than one still rolling firmly.
            </p>
            <Welcome />
          </div>
          <BreakDiagram className="mx-auto w-full max-w-xs lg:max-w-sm" />
        </div>
      </section>

      <section aria-labelledby="what-you-enter" className="mt-12 sm:mt-16">
        <h2 id="what-you-enter" className="text-2xl font-semibold tracking-tight">
          Four numbers make a read
        </h2>
        <dl className="mt-5 grid grid-cols-2 gap-3 lg:grid-cols-4">
          {inputs.map((item, i) => (
            <div key={item.term} className="rounded-2xl border-2 border-ink-900/10 bg-sand-50 p-4 sm:p-5">
              <dt className="flex items-baseline gap-2 text-lg font-semibold">
                <span className="text-sm font-semibold text-coral-600 tabular-nums">{i + 1}</span>
                {item.term}
              </dt>
              <dd className="mt-1 text-ink-500">{item.detail}</dd>
            </div>
          ))}
        </dl>
      </section>

      <section aria-labelledby="what-it-does" className="mt-12 sm:mt-16">
        <h2 id="what-it-does" className="text-2xl font-semibold tracking-tight">
          For the golfer and the coach who works with them
        </h2>
        <div className="mt-5 grid gap-4 md:grid-cols-3">
          {pillars.map((p) => (
            <Card key={p.title}>
              <h3 className="text-lg font-semibold">{p.title}</h3>
              <p className="mt-2 leading-relaxed text-ink-600">{p.body}</p>
            </Card>
          ))}
        </div>
        <p className="mt-6 max-w-3xl text-sm text-ink-500">
          Measure green speed only where the course allows it, and off the line of play.
        </p>
      </section>
    </>
  );
}

export { HomeRoute as Component };
