import type { ButtonHTMLAttributes, Ref } from "react";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import clsx from "clsx";
import { get, type FieldErrors, type UseFormRegister } from "react-hook-form";
import { BREAK_TYPES } from "#shared/schemas/putts";
import { longUnitLabel, type UnitSystem } from "#shared/units";
import { Button, InputField, SelectField } from "../../../components/ui";
import type { LadderFormValues } from "../utils/ladder-form";
import { BREAK_TYPE_WORDS } from "../utils/rule-words";

export type RungEditorProps = {
  id: string;
  index: number;
  count: number;
  units: UnitSystem;
  register: UseFormRegister<LadderFormValues>;
  errors: FieldErrors<LadderFormValues>;
  passKind: "make" | "in-a-row";
  onMove: (from: number, to: number) => void;
  onDuplicate: (index: number) => void;
  onRemove: (index: number) => void;
};

const breakOptions = [{ value: "", label: "Not set" }, ...BREAK_TYPES.map((b) => ({ value: b, label: BREAK_TYPE_WORDS[b] }))];
const ruleOptions = [
  { value: "make", label: "Hole a number of the balls" },
  { value: "in-a-row", label: "Hole a number in a row" },
];

function DragHandle({ label, ...rest }: { label: string } & ButtonHTMLAttributes<HTMLButtonElement> & { ref?: Ref<HTMLButtonElement> }) {
  return (
    <button
      type="button"
      aria-label={label}
      className="flex size-11 shrink-0 cursor-grab touch-none items-center justify-center rounded-lg text-ink-500 hover:bg-ink-900/5 active:cursor-grabbing"
      {...rest}
    >
      <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5 fill-current">
        <circle cx="7" cy="5" r="1.6" />
        <circle cx="13" cy="5" r="1.6" />
        <circle cx="7" cy="10" r="1.6" />
        <circle cx="13" cy="10" r="1.6" />
        <circle cx="7" cy="15" r="1.6" />
        <circle cx="13" cy="15" r="1.6" />
      </svg>
    </button>
  );
}

/** One rung of the builder: its numbers, and the controls to move, copy or delete it. Sortable by drag and keyboard. */
export function RungEditor({ id, index, count, units, register, errors, passKind, onMove, onDuplicate, onRemove }: RungEditorProps) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id });
  const err = (field: string) => (get(errors, `rungs.${index}.${field}`) as { message?: string } | undefined)?.message;
  const n = index + 1;
  const first = index === 0;
  const last = index === count - 1;
  return (
    <li
      ref={setNodeRef}
      data-rung-index={index}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      className={clsx(
        "rounded-(--radius-card) bg-white p-4 ring-1 ring-ink-900/10 sm:p-5",
        isDragging && "relative z-10 shadow-xl ring-2 ring-coral-500",
      )}
      aria-label={`Rung ${n}`}
    >
      <div className="mb-3 flex items-center gap-2">
        <DragHandle label={`Drag rung ${n}`} ref={setActivatorNodeRef} {...attributes} {...listeners} />
        <h3 className="text-lg font-semibold tracking-tight">Rung {n}</h3>
        <div className="ml-auto flex flex-wrap justify-end gap-1">
          <Button
            size="sm"
            variant="ghost"
            aria-label={`Move rung ${n} up`}
            aria-disabled={first}
            onClick={() => !first && onMove(index, index - 1)}
          >
            Up
          </Button>
          <Button
            size="sm"
            variant="ghost"
            aria-label={`Move rung ${n} down`}
            aria-disabled={last}
            onClick={() => !last && onMove(index, index + 1)}
          >
            Down
          </Button>
        </div>
      </div>
      <div className="grid grid-cols-2 gap-4">
        <InputField
          label={`Distance (${longUnitLabel(units)})`}
          inputMode="decimal"
          autoComplete="off"
          error={err("distance")}
          {...register(`rungs.${index}.distance`)}
        />
        <InputField label="Balls" inputMode="numeric" autoComplete="off" error={err("balls")} {...register(`rungs.${index}.balls`)} />
        <SelectField
          label="Pass rule"
          options={ruleOptions}
          containerClassName="col-span-2 sm:col-span-1"
          {...register(`rungs.${index}.passKind`)}
        />
        <InputField
          label={passKind === "make" ? "Holed needed" : "Holed in a row"}
          containerClassName="col-span-2 sm:col-span-1"
          inputMode="numeric"
          autoComplete="off"
          error={err("need")}
          {...register(`rungs.${index}.need`)}
        />
        <SelectField
          label="Break (optional)"
          options={breakOptions}
          containerClassName="col-span-2 sm:col-span-1"
          {...register(`rungs.${index}.breakType`)}
        />
        <InputField
          label="Note for the player (optional)"
          containerClassName="col-span-2 sm:col-span-1"
          autoComplete="off"
          error={err("note")}
          {...register(`rungs.${index}.note`)}
        />
      </div>
      <div className="mt-3 flex flex-wrap gap-2 border-t border-ink-900/10 pt-3">
        <Button size="sm" variant="secondary" onClick={() => onDuplicate(index)} aria-label={`Duplicate rung ${n}`}>
          Duplicate
        </Button>
        {count > 1 ? (
          <Button size="sm" variant="ghost" onClick={() => onRemove(index)} aria-label={`Delete rung ${n}`}>
            Delete
          </Button>
        ) : null}
      </div>
    </li>
  );
}
