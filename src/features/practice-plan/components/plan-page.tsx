import { PageHeader } from "../../../components/ui";
import { PracticePlanView } from "./plan-view";

/** The signed-in player's practice plan (/practice/plan). */
export function PracticePlanPage() {
  return (
    <>
      <title>Practice plan · Borrowline</title>
      <PageHeader
        title="Practice plan"
        description="Where your putts cost the most strokes a round, and a ladder, a weekly volume and a read-training level to win them back."
      />
      <PracticePlanView mode="player" />
    </>
  );
}
