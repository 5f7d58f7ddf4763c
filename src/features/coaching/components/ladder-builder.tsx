import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch, get, type FieldErrors, type Resolver } from "react-hook-form";
import { useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import {
  DndContext,
  KeyboardSensor,
  PointerSensor,
  closestCenter,
  useSensor,
  useSensors,
  type Announcements,
  type DragEndEvent,
} from "@dnd-kit/core";
import { SortableContext, sortableKeyboardCoordinates, verticalListSortingStrategy } from "@dnd-kit/sortable";
import { FAIL_RULES, rungSchema, type Ladder, type LadderInput } from "#shared/schemas/ladders";
import type { UnitSystem } from "#shared/units";
import { Alert, Button, Card, ChoiceGroup, InputField } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useSaveLadder } from "../api/save-ladder";
import {
  emptyLadderForm,
  ladderToForm,
  nextRung,
  rungToInput,
  serverFieldsToForm,
  validateLadderForm,
  type LadderFormErrors,
  type LadderFormValues,
} from "../utils/ladder-form";
import { FAIL_RULE_WORDS } from "../utils/rule-words";
import { LadderPreview, type PreviewRung } from "./ladder-preview";
import { RungEditor } from "./rung-editor";

/** Flat messages ("rungs.2.need") as react-hook-form's nested errors. */
function nestErrors(flat: LadderFormErrors): FieldErrors<LadderFormValues> {
  const root: Record<string, unknown> = {};
  for (const [path, message] of Object.entries(flat)) {
    const parts = (path === "rungs" ? "rungs.root" : path).split(".");
    let at = root;
    parts.slice(0, -1).forEach((p) => {
      at[p] ??= {};
      at = at[p] as Record<string, unknown>;
    });
    at[parts.at(-1)!] = { type: "validate", message };
  }
  return root as FieldErrors<LadderFormValues>;
}

function ladderResolver(units: UnitSystem): Resolver<LadderFormValues, unknown, LadderInput> {
  return (values) => {
    const result = validateLadderForm(values, units);
    return result.ok ? { values: result.input, errors: {} } : { values: {}, errors: nestErrors(result.errors) };
  };
}

const failChoices = FAIL_RULES.map((r) => ({ value: r, label: FAIL_RULE_WORDS[r].label, description: FAIL_RULE_WORDS[r].description }));

export type LadderBuilderProps = {
  units: UnitSystem;
  /** The ladder being edited; a new one when absent. */
  ladder?: Ladder;
  /** Where to go after saving (default: the ladder's own page, to assign it). */
  onSaved?: (ladder: Ladder) => void;
};

/** Builds or edits a ladder: its rungs in order (drag, keyboard or the Up/Down buttons), with the player's view beside it. */
export function LadderBuilder({ units, ladder, onSaved }: LadderBuilderProps) {
  const navigate = useNavigate();
  const save = useSaveLadder();
  const [moved, setMoved] = useState("");
  const defaultValues = useMemo(() => (ladder ? ladderToForm(ladder, units) : emptyLadderForm(units)), [ladder, units]);
  const resolver = useMemo(() => ladderResolver(units), [units]);
  const {
    register,
    control,
    handleSubmit,
    getValues,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<LadderFormValues, unknown, LadderInput>({ defaultValues, resolver });
  const { fields, append, insert, remove, move } = useFieldArray({ control, name: "rungs" });
  const watched = useWatch({ control }) as LadderFormValues;

  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

  const rungNumber = (id: string | number) => fields.findIndex((f) => f.id === id) + 1;
  const announcements: Announcements = {
    onDragStart: ({ active }) =>
      `Picked up rung ${rungNumber(active.id)}. Use the up and down arrows to move it, space to drop it, escape to cancel.`,
    onDragOver: ({ active, over }) =>
      over
        ? `Rung ${rungNumber(active.id)} is over position ${rungNumber(over.id)}.`
        : `Rung ${rungNumber(active.id)} is not over a position.`,
    onDragEnd: ({ active, over }) =>
      over ? `Rung ${rungNumber(active.id)} dropped at position ${rungNumber(over.id)}.` : `Rung ${rungNumber(active.id)} dropped.`,
    onDragCancel: ({ active }) => `Moving rung ${rungNumber(active.id)} was cancelled.`,
  };

  const moveRung = (from: number, to: number) => {
    move(from, to);
    setMoved(`Rung ${from + 1} moved to position ${to + 1}.`);
  };

  const onDragEnd = ({ active, over }: DragEndEvent) => {
    if (!over || active.id === over.id) return;
    const from = fields.findIndex((f) => f.id === active.id);
    const to = fields.findIndex((f) => f.id === over.id);
    if (from >= 0 && to >= 0) move(from, to);
  };

  const preview: PreviewRung[] = (watched.rungs ?? []).map((r) => {
    const parsed = rungSchema.safeParse(rungToInput(r, units));
    return parsed.success ? parsed.data : null;
  });

  const onSubmit = async (input: LadderInput) => {
    try {
      const saved = await save.mutateAsync({ id: ladder?.id, input });
      toast.success(ladder ? `${saved.name} saved.` : `${saved.name} is in your library. Give it to your players next.`);
      if (onSaved) onSaved(saved);
      else await navigate(paths.ladder.href(saved.id));
    } catch (error) {
      const fields = isApiError(error) ? serverFieldsToForm(error.fields) : {};
      const entries = Object.entries(fields);
      if (entries.length > 0) for (const [path, message] of entries) setError(path as "name", { type: "server", message });
      else setError("root", { type: "server", message: isApiError(error) ? error.message : "Could not save the ladder." });
    }
  };

  const rootRungsError = (get(errors, "rungs.root") as { message?: string } | undefined)?.message;

  return (
    <form
      noValidate
      onSubmit={handleSubmit(onSubmit)}
      aria-label={ladder ? `Edit ${ladder.name}` : "New ladder"}
      className="grid gap-6 lg:grid-cols-[1.4fr_1fr]"
    >
      <div className="flex min-w-0 flex-col gap-6">
        {errors.root?.message ? <Alert tone="error">{errors.root.message}</Alert> : null}
        <Card>
          <div className="flex flex-col gap-4">
            <InputField label="Ladder name" autoComplete="off" error={errors.name?.message} {...register("name")} />
            <InputField
              label="Description (optional)"
              hint="What the ladder trains, in a sentence the player will read."
              autoComplete="off"
              error={errors.description?.message}
              {...register("description")}
            />
            <ChoiceGroup legend="When a rung is missed" columns={1} choices={failChoices} inputProps={register("failRule")} />
          </div>
        </Card>

        <section aria-labelledby="rungs-title" className="flex flex-col gap-3">
          <div className="flex items-baseline justify-between gap-3">
            <h2 id="rungs-title" className="text-xl font-semibold tracking-tight">
              Rungs
            </h2>
            <p className="text-sm text-ink-500">Drag the handle, or focus it and use space and the arrow keys.</p>
          </div>
          {rootRungsError ? <Alert tone="error">{rootRungsError}</Alert> : null}
          <DndContext
            sensors={sensors}
            collisionDetection={closestCenter}
            onDragEnd={onDragEnd}
            accessibility={{
              announcements,
              screenReaderInstructions: {
                draggable:
                  "To move a rung, press space or enter, move it with the up and down arrows, and press space or enter again to drop it. Escape cancels.",
              },
            }}
          >
            <SortableContext items={fields.map((f) => f.id)} strategy={verticalListSortingStrategy}>
              <ol className="flex flex-col gap-3">
                {fields.map((field, index) => (
                  <RungEditor
                    key={field.id}
                    id={field.id}
                    index={index}
                    count={fields.length}
                    units={units}
                    register={register}
                    errors={errors}
                    passKind={watched.rungs?.[index]?.passKind ?? "make"}
                    onMove={moveRung}
                    onDuplicate={(i) => insert(i + 1, { ...getValues(`rungs.${i}`) })}
                    onRemove={(i) => remove(i)}
                  />
                ))}
              </ol>
            </SortableContext>
          </DndContext>
          <p role="status" aria-live="polite" className="sr-only">
            {moved}
          </p>
          <Button
            variant="secondary"
            onClick={() => append(nextRung(getValues("rungs").at(-1), units))}
            className="self-start"
            disabled={fields.length >= 20}
          >
            Add a rung
          </Button>
        </section>

        <div className="flex flex-wrap gap-3">
          <Button type="submit" size="lg" loading={isSubmitting} loadingText="Saving…">
            {ladder ? "Save ladder" : "Save ladder"}
          </Button>
          <Button variant="ghost" size="lg" onClick={() => void navigate(ladder ? paths.ladder.href(ladder.id) : paths.ladders.href())}>
            Cancel
          </Button>
        </div>
      </div>

      <div className="lg:sticky lg:top-24 lg:self-start">
        <LadderPreview
          name={watched.name ?? ""}
          description={watched.description}
          failRule={watched.failRule ?? "repeat"}
          rungs={preview}
          units={units}
        />
      </div>
    </form>
  );
}
