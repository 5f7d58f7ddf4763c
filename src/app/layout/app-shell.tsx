import { Outlet, ScrollRestoration } from "react-router";
import { VerifyEmailNotice } from "../../features/auth/components/verify-email-notice";
import { Link } from "react-router";
import { paths } from "../../config/paths";
import { SCROLL_POSITIONS_KEY, scrollKey } from "../scroll-positions";
import { useDevMailAvailable } from "../../features/dev-mail/api/get-dev-mail";
import { useFocusHeadingOnNavigate } from "./focus-on-navigate";
import { SectionNav } from "./section-nav";
import { TopBar } from "./top-bar";

/** No real mail server is configured: the e-mails Borrowline sends wait in a local inbox (shown to admins only). */
function DevMailLink() {
  const available = useDevMailAvailable();
  if (!available) return null;
  return (
    <p>
      No mail server is set up: e-mail is not delivered but held in the{" "}
      <Link className="font-medium text-ink-700 underline underline-offset-4" to={paths.mailbox.href()}>
        local inbox
      </Link>
      .
    </p>
  );
}

export function AppShell() {
  useFocusHeadingOnNavigate();
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only rounded-lg bg-coral-500 px-4 py-3 font-medium text-ink-950 focus:not-sr-only focus:fixed focus:top-3 focus:left-3 focus:z-50"
      >
        Skip to content
      </a>
      <TopBar />
      <div className="print:hidden">
        <VerifyEmailNotice />
      </div>
      {/* At least a screen tall under the 4rem top bar: the footer starts below the first screen, so a page that grows
          as its data arrives never moves it in view (issue 18: layout shift on /read). */}
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto min-h-[calc(100dvh-4rem)] w-full max-w-6xl flex-1 px-4 py-8 focus:outline-none sm:px-6 sm:py-12 print:min-h-0 print:max-w-none print:p-0"
      >
        <SectionNav />
        <Outlet />
      </main>
      <footer className="border-t border-ink-900/10 print:hidden">
        <div className="mx-auto flex max-w-6xl flex-col gap-1 px-4 py-6 text-sm text-ink-500 sm:px-6">
          <p>
            <span className="font-semibold text-ink-700">Borrowline</span> — reads for the putt in front of you, practice that shows where
            the strokes go.
          </p>
          <p>A read assumes an even slope and a true-rolling ball. Grain, wind and contours are yours to judge.</p>
          <DevMailLink />
        </div>
      </footer>
      <ScrollRestoration storageKey={SCROLL_POSITIONS_KEY} getKey={scrollKey} />
    </div>
  );
}
