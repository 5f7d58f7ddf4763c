// A green's sharing card on its page (green-page.tsx): the owner, a coach, shares it with one of their squads.
import { useState } from "react";
import type { Green } from "#shared/schemas/greens";
import { Alert, Button, Card, CardTitle, SelectField } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useCoachedSquads } from "../api/get-coached-squads";
import { useShareGreen } from "../api/share-green";

/** The owner (a coach) shares the green with one of their squads, or keeps it to themselves. */
export function ShareCard({ green }: { green: Green }) {
  const squads = useCoachedSquads(true);
  const share = useShareGreen(green.id);
  const [choice, setChoice] = useState(green.squad?.id ?? "");
  const fields = isApiError(share.error) ? share.error.fields : {};
  const list = squads.data?.squads ?? [];
  const changed = choice !== (green.squad?.id ?? "");
  return (
    <Card>
      <CardTitle>Who practises on it</CardTitle>
      <p className="mt-2 text-sm text-ink-600">
        {green.squad
          ? `Shared with ${green.squad.name}: its players see this green and its readings, log sessions on it and read on its height map. Only you change it.`
          : "Only you see this green. Share it with a squad so its players can log sessions on it and read on its height map."}
      </p>
      {squads.isPending ? <p className="mt-3 text-sm text-ink-500">Loading your squads…</p> : null}
      {squads.isError ? (
        <Alert tone="error" className="mt-3">
          {errorMessage(squads.error)}
        </Alert>
      ) : null}
      {squads.data && list.length === 0 && !green.squad ? (
        <p className="mt-3 text-sm text-ink-500">You have no squad yet to share it with.</p>
      ) : null}
      {squads.data && (list.length > 0 || green.squad) ? (
        <form
          aria-label="Share the green"
          noValidate
          className="mt-4 grid items-start gap-3 sm:grid-cols-[minmax(0,20rem)_auto]"
          onSubmit={(e) => {
            e.preventDefault();
            share.mutate({ squadId: choice === "" ? null : choice });
          }}
        >
          <SelectField
            label="Shared with"
            options={[{ value: "", label: "Nobody (only me)" }, ...list.map((q) => ({ value: q.id, label: q.name }))]}
            value={choice}
            onChange={(e) => {
              setChoice(e.target.value);
              share.reset();
            }}
            error={fields.squadId}
          />
          <Button
            type="submit"
            disabled={!changed}
            loading={share.isPending}
            loadingText="Saving…"
            className="sm:mt-7 sm:justify-self-start"
          >
            {choice === "" && green.squad ? "Stop sharing" : "Share"}
          </Button>
          {share.isError && !fields.squadId ? (
            <Alert tone="error" className="sm:col-span-2">
              {errorMessage(share.error)}
            </Alert>
          ) : null}
          {share.isSuccess && !changed ? (
            <Alert tone="success" className="sm:col-span-2">
              {green.squad ? `${green.squad.name} can practise on it now.` : "This green is yours alone again."}
            </Alert>
          ) : null}
        </form>
      ) : null}
    </Card>
  );
}
