import { formatDate, stimpText } from "../../../../shared/format";
import { useState } from "react";
import { useNavigate } from "react-router";
import type { Green, StimpReading } from "../../../../shared/schemas/greens";
import { STIMP_LIMITS } from "../../../../shared/schemas/greens";
import { Alert, Button, ButtonLink, Card, CardTitle, ChipGroup, ConfirmDialog, InputField, PageHeader, PageSpinner, SelectField } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useAddStimpReading } from "../api/add-stimp-reading";
import { useDeleteGreen } from "../api/delete-green";
import { useDeleteStimpReading } from "../api/delete-stimp-reading";
import { useCoachedSquads } from "../api/get-coached-squads";
import { useGreen } from "../api/get-green";
import { useShareGreen } from "../api/share-green";
import { useUpdateGreen } from "../api/update-green";
import { useUnits } from "../../auth/hooks/use-units";
import { todayIso } from "../utils/dates";
import { formatRoll, stimpFeetAndInches } from "../utils/stimp";
import { STIMP_CAUTION, StimpHelper } from "./stimp-helper";
import { parseDecimal } from "../../../../shared/units";

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

function ReadingForm({ greenId }: { greenId: string }) {
  const { units } = useUnits();
  const add = useAddStimpReading(greenId);
  const [mode, setMode] = useState<"level" | "slope">("level");
  const [measuredOn, setMeasuredOn] = useState(todayIso());
  const [stimp, setStimp] = useState("");
  const [saved, setSaved] = useState<string | null>(null);
  // A new helper after each save, so the same rolls are not saved twice by a second tap.
  const [entry, setEntry] = useState(0);
  const value = parseDecimal(stimp);
  const stimpOk = value !== null && value >= STIMP_LIMITS.minFt && value <= STIMP_LIMITS.maxFt;
  const fields = isApiError(add.error) ? add.error.fields : {};
  const done = (g: Green) => {
    setStimp("");
    setEntry((n) => n + 1);
    setSaved(`Saved ${g.readings[0] ? stimpFeetAndInches(g.readings[0].stimpFt) : ""} for ${formatDate(measuredOn)}.`);
  };

  return (
    <Card>
      <CardTitle>Add a Stimp reading</CardTitle>
      <div className="mt-4 flex flex-col gap-4">
        <div className="grid gap-4 sm:grid-cols-2">
          <InputField
            label="Measured on"
            type="date"
            value={measuredOn}
            max={todayIso()}
            onChange={(e) => setMeasuredOn(e.target.value)}
            error={fields.measuredOn}
          />
          <ChipGroup
            legend="Where it was rolled"
            columns={2}
            options={[
              { value: "level", label: "A level spot" },
              { value: "slope", label: "On a slope, both ways" },
            ]}
            value={mode}
            onChange={(v) => {
              if (v) setMode(v as "level" | "slope");
              add.reset();
              setSaved(null);
            }}
          />
        </div>
        {mode === "level" ? (
          <form
            noValidate
            aria-label="Stimp reading on a level spot"
            className="flex flex-col gap-4"
            onSubmit={(e) => {
              e.preventDefault();
              if (stimpOk && value !== null) add.mutate({ measuredOn, stimpFt: value }, { onSuccess: done });
            }}
          >
            <InputField
              label="Stimp (ft)"
              inputMode="decimal"
              autoComplete="off"
              placeholder="e.g. 9.5"
              hint="The average distance the balls rolled off the Stimpmeter, in feet."
              value={stimp}
              onChange={(e) => {
                setStimp(e.target.value);
                setSaved(null);
              }}
              error={
                fields.stimpFt ??
                (stimp.trim() !== "" && !stimpOk ? `Between ${STIMP_LIMITS.minFt} and ${STIMP_LIMITS.maxFt} ft` : undefined)
              }
              containerClassName="sm:max-w-xs"
            />
            <Alert tone="warning">{STIMP_CAUTION}</Alert>
            <Button type="submit" disabled={!stimpOk} loading={add.isPending} loadingText="Saving…" className="sm:self-start">
              Save the reading
            </Button>
          </form>
        ) : (
          <StimpHelper
            key={entry}
            units={units}
            saving={add.isPending}
            onSave={({ upFt, downFt }) => add.mutate({ measuredOn, upFt, downFt }, { onSuccess: done })}
          />
        )}
        {add.isError ? (
          <Alert tone="error">
            {Object.values(fields)[0] ? `${errorMessage(add.error)} (${Object.values(fields).join("; ")})` : errorMessage(add.error)}
          </Alert>
        ) : null}
        {saved ? <Alert tone="success">{saved}</Alert> : null}
      </div>
    </Card>
  );
}

function ReadingsList({ green, canEdit }: { green: Green; canEdit: boolean }) {
  const { units } = useUnits();
  const remove = useDeleteStimpReading(green.id);
  const [confirm, setConfirm] = useState<StimpReading | null>(null);
  if (green.readings.length === 0) {
    return (
      <p className="text-ink-500">
        {canEdit ? "No readings yet. Add one below; it becomes the green’s speed for new sessions." : `No readings yet. ${green.ownerName} keeps this green’s readings.`}
      </p>
    );
  }
  return (
    <>
      <ul className="flex flex-col gap-2" aria-label="Stimp readings, newest first">
        {green.readings.map((r, i) => (
          <li key={r.id} className="flex items-center gap-3 rounded-xl bg-white px-4 py-3 ring-1 ring-ink-900/5">
            <div className="min-w-0 flex-1">
              <p className="font-medium">
                {stimpFeetAndInches(r.stimpFt)}
                {i === 0 ? <span className="ml-2 rounded-full bg-ok-50 px-2 py-0.5 text-xs font-medium text-ok-800">current</span> : null}
              </p>
              <p className="text-sm text-ink-500">
                {formatDate(r.measuredOn)}
                {r.upFt !== null && r.downFt !== null
                  ? ` · on a slope: ${formatRoll(r.upFt, units)} up, ${formatRoll(r.downFt, units)} down`
                  : " · level spot"}
              </p>
            </div>
            {canEdit ? (
              <button
                type="button"
                onClick={() => setConfirm(r)}
                className="min-h-11 rounded-lg px-3 text-sm font-medium text-bad-600 hover:bg-bad-50"
                aria-label={`Delete the reading of ${formatDate(r.measuredOn)}`}
              >
                Delete
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      <ConfirmDialog
        open={confirm !== null}
        title="Delete this reading?"
        confirmLabel="Delete reading"
        busy={remove.isPending}
        onCancel={() => setConfirm(null)}
        onConfirm={() => confirm && remove.mutate(confirm.id, { onSettled: () => setConfirm(null) })}
      >
        {confirm
          ? `${stimpFeetAndInches(confirm.stimpFt)} measured ${formatDate(confirm.measuredOn)}. Sessions already logged keep their Stimp.`
          : null}
      </ConfirmDialog>
    </>
  );
}

/** The owner (a coach) shares the green with one of their squads, or keeps it to themselves. */
function ShareCard({ green }: { green: Green }) {
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
      {squads.data && list.length === 0 && !green.squad ? <p className="mt-3 text-sm text-ink-500">You have no squad yet to share it with.</p> : null}
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
          <Button type="submit" disabled={!changed} loading={share.isPending} loadingText="Saving…" className="sm:mt-7 sm:justify-self-start">
            {choice === "" && green.squad ? "Stop sharing" : "Share"}
          </Button>
          {share.isError && !fields.squadId ? <Alert tone="error" className="sm:col-span-2">{errorMessage(share.error)}</Alert> : null}
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
          {g.ownerName} keeps this green: only they rename it, add Stimp readings or change its height map. Note the speed you measure today on your session.
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
