import { stimpText } from "#shared/format";
import { useState } from "react";
import { useNavigate } from "react-router";
import type { Green } from "#shared/schemas/greens";
import { Alert, Button, ButtonLink, Card, ConfirmDialog, InputField, PageHeader, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useDeleteGreen } from "../api/delete-green";
import { useGreen } from "../api/get-green";
import { useUpdateGreen } from "../api/update-green";
import { ShareCard } from "./green-share-card";
import { ReadingForm, ReadingsList } from "./green-readings";

function RenameForm({ green, onDone }: { green: Green; onDone: () => void }) {
  const update = useUpdateGreen(green.id);
  const [name, setName] = useState(green.name);
  const [note, setNote] = useState(green.locationNote ?? "");
  const fields = isApiError(update.error) ? update.error.fields : {};
  return (
    <form
      aria-label="Rename the green"
      noValidate
      className="grid items-start gap-3 sm:grid-cols-[1fr_1fr_auto_auto]"
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate({ name: name.trim(), locationNote: note.trim() || null }, { onSuccess: onDone });
      }}
    >
      <InputField
        label="Name"
        value={name}
        onChange={(e) => setName(e.target.value)}
        error={fields.name ?? (name.trim() === "" ? "Give the green a name" : undefined)}
      />
      <InputField label="Where (optional)" value={note} onChange={(e) => setNote(e.target.value)} error={fields.locationNote} />
      <Button type="submit" loading={update.isPending} loadingText="Saving…" disabled={name.trim() === ""} className="sm:mt-7">
        Save
      </Button>
      <Button variant="ghost" onClick={onDone} className="sm:mt-7">
        Cancel
      </Button>
      {update.isError && Object.keys(fields).length === 0 ? (
        <Alert tone="error" className="sm:col-span-4">
          {errorMessage(update.error)}
        </Alert>
      ) : null}
    </form>
  );
}

/** One green: rename, share or delete it (its owner), its dated Stimp readings, and the Stimp helper. */
export function GreenPage({ greenId, canShare = false }: { greenId: string; canShare?: boolean }) {
  const green = useGreen(greenId);
  const remove = useDeleteGreen();
  const navigate = useNavigate();
  const [renaming, setRenaming] = useState(false);
  const [confirm, setConfirm] = useState(false);

  if (green.isPending) return <PageSpinner label="Loading the green" />;
  if (green.isError) {
    return (
      <Alert
        tone="error"
        title="Could not open this green"
        action={
          <ButtonLink to={paths.greens.href()} size="sm" variant="secondary">
            All greens
          </ButtonLink>
        }
      >
        {errorMessage(green.error)}
      </Alert>
    );
  }
  const g = green.data;
  return (
    <div className="flex flex-col gap-6">
      <title>{`${g.name} · Greens · Borrowline`}</title>
      {renaming ? (
        <Card>
          <RenameForm green={g} onDone={() => setRenaming(false)} />
        </Card>
      ) : (
        <PageHeader
          eyebrow="Green"
          title={g.name}
          description={[
            g.locationNote,
            g.currentStimpFt !== null ? `${stimpText(g.currentStimpFt)} ft (latest reading)` : "No Stimp reading yet",
            g.mine ? null : `Shared with ${g.squad?.name ?? "your squad"} by ${g.ownerName}`,
          ]
            .filter(Boolean)
            .join(" · ")}
          actions={
            <>
              <ButtonLink to={paths.greenMap.href(g.id)} variant="secondary" size="sm">
                Height map and reads
              </ButtonLink>
              {g.mine ? (
                <ButtonLink to={`${paths.greenMap.href(g.id)}#map-by-walking`} variant="secondary" size="sm">
                  Map this green
                </ButtonLink>
              ) : null}
              {g.mine ? (
                <>
                  <Button variant="secondary" size="sm" onClick={() => setRenaming(true)}>
                    Rename
                  </Button>
                  <Button variant="ghost" size="sm" className="text-bad-600" onClick={() => setConfirm(true)}>
                    Delete
                  </Button>
                </>
              ) : null}
            </>
          }
        />
      )}
      <section aria-labelledby="readings-heading" className="flex flex-col gap-3">
        <h2 id="readings-heading" className="text-xl font-semibold tracking-tight">
          Stimp readings
        </h2>
        <ReadingsList green={g} canEdit={g.mine} />
      </section>
      {g.mine ? (
        <ReadingForm greenId={g.id} />
      ) : (
        <Alert tone="info">
          {g.ownerName} keeps this green: only they rename it, add Stimp readings or change its height map. Note the speed you measure today
          on your session.
        </Alert>
      )}
      {g.mine && canShare ? <ShareCard green={g} /> : null}
      <ButtonLink to={paths.greens.href()} variant="ghost" className="self-start">
        All greens
      </ButtonLink>
      <ConfirmDialog
        open={confirm}
        title={`Delete ${g.name}?`}
        confirmLabel="Delete green"
        busy={remove.isPending}
        onCancel={() => setConfirm(false)}
        onConfirm={() => remove.mutate(g.id, { onSuccess: () => void navigate(paths.greens.href()), onSettled: () => setConfirm(false) })}
      >
        Its Stimp readings go with it. Sessions logged on it keep their putts and their Stimp, without the green’s name.
      </ConfirmDialog>
    </div>
  );
}
