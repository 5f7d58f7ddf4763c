// A green's dated Stimp readings on its page (green-page.tsx): the form that adds one and the list that shows them.
import { formatDate } from "#shared/format";
import { useState } from "react";
import type { Green, StimpReading } from "#shared/schemas/greens";
import { STIMP_LIMITS } from "#shared/schemas/greens";
import { Alert, Button, Card, CardTitle, ChipGroup, ConfirmDialog, InputField } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useAddStimpReading } from "../api/add-stimp-reading";
import { useDeleteStimpReading } from "../api/delete-stimp-reading";
import { useUnits } from "../../auth/hooks/use-units";
import { todayIso } from "../utils/dates";
import { formatRoll, stimpFeetAndInches } from "../utils/stimp";
import { STIMP_CAUTION, StimpHelper } from "./stimp-helper";
import { parseDecimal } from "#shared/units";

export function ReadingForm({ greenId }: { greenId: string }) {
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

export function ReadingsList({ green, canEdit }: { green: Green; canEdit: boolean }) {
  const { units } = useUnits();
  const remove = useDeleteStimpReading(green.id);
  const [confirm, setConfirm] = useState<StimpReading | null>(null);
  if (green.readings.length === 0) {
    return (
      <p className="text-ink-500">
        {canEdit
          ? "No readings yet. Add one below; it becomes the green’s speed for new sessions."
          : `No readings yet. ${green.ownerName} keeps this green’s readings.`}
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
