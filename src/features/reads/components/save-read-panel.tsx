import { stimpText } from "#shared/format";
import { useId, useState, type FormEvent } from "react";
import { Alert, Button, InputField, SelectField } from "../../../components/ui";
import type { ReadRequest } from "#shared/schemas/reads";
import { useGreenChoices } from "../api/get-greens";
import { useSaveRead } from "../api/save-read";

export type SaveReadPanelProps = { request: ReadRequest };

/** "Save this read", with an optional label and, when the player has greens, the green it was read on. */
export function SaveReadPanel({ request }: SaveReadPanelProps) {
  const headingId = useId();
  const [label, setLabel] = useState("");
  const [greenId, setGreenId] = useState("");
  const greens = useGreenChoices();
  const save = useSaveRead();
  const choices = greens.data ?? [];

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    const trimmed = label.trim();
    save.mutate({ read: request, label: trimmed || undefined, greenId: greenId || undefined }, { onSuccess: () => setLabel("") });
  };

  return (
    <form onSubmit={onSubmit} aria-labelledby={headingId} className="flex flex-col gap-4">
      <h2 id={headingId} className="text-lg font-semibold tracking-tight">
        Save this read
      </h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField
          label="Label (optional)"
          placeholder="e.g. 9th, back pin"
          maxLength={80}
          value={label}
          onChange={(e) => setLabel(e.target.value)}
        />
        {choices.length > 0 ? (
          <SelectField
            label="Green (optional)"
            value={greenId}
            onChange={(e) => setGreenId(e.target.value)}
            options={[
              { value: "", label: "No green" },
              ...choices.map((g) => ({
                value: g.id,
                label: g.currentStimpFt !== null ? `${g.name} (${stimpText(g.currentStimpFt)})` : g.name,
              })),
            ]}
          />
        ) : (
          <p className="self-end pb-3 text-sm text-ink-500">
            {greens.isPending ? "Looking for your greens…" : "Saved without a green (you have none saved yet)."}
          </p>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" loading={save.isPending} loadingText="Saving…">
          Save this read
        </Button>
        {save.isSuccess && !save.isPending ? (
          <p role="status" className="text-sm font-medium text-ok-800">
            Saved. It is in your list below.
          </p>
        ) : null}
      </div>
      {save.isError ? (
        <Alert tone="error" title="Could not save the read">
          {save.error.message}
        </Alert>
      ) : null}
    </form>
  );
}
