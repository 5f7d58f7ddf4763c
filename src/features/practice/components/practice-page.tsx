import { PageHeader, ButtonLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { HistorySection } from "./history-section";
import { StartSessionForm } from "./start-session-form";

/** Practice: start a session on the green, and the history of sessions and putts. */
export function PracticePage() {
  return (
    <div className="flex flex-col gap-8">
      <title>Practice · Borrowline</title>
      <PageHeader
        eyebrow="Practice log"
        title="Practice"
        // Phone first: on a phone the header stays short so "Start logging" shows without scrolling; the CSV link
        // comes after the form there.
        shortOnPhone
        description="Log putts on the practice green as you hit them; every putt feeds your make rates."
        actions={
          <ButtonLink to={paths.practiceImport.href()} variant="secondary" size="sm">
            Import or export CSV
          </ButtonLink>
        }
      />
      <StartSessionForm />
      <div className="-mt-4 sm:hidden">
        <ButtonLink to={paths.practiceImport.href()} variant="secondary" size="sm">
          Import or export CSV
        </ButtonLink>
      </div>
      <HistorySection />
    </div>
  );
}
