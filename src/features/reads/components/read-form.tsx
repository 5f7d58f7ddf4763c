// The read form: distance, slope, fall line (named directions or the dial), Stimp and pace, in the user's units.
// Over 300 lines on purpose (issue 16): one react-hook-form form whose fields, debounced commits, dial preview and
// server-error focus all read and write the same form state; split, each part would take the form's methods as props.
import { useCallback, useEffect, useId, useLayoutEffect, useRef, useState } from "react";
import { useForm, useWatch, type FieldErrors } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import clsx from "clsx";
import { Button, InputField } from "../../../components/ui";
import type { UnitSystem } from "#shared/units";
import { useDebouncedCallback } from "../hooks/use-debounced-callback";
import { NAMED_DIRECTIONS, describeFallLine, normaliseDeg } from "../utils/directions";
import {
  FIELD_SPECS,
  convertFormValues,
  fieldLimits,
  formatNumber,
  fromFormValues,
  parseNumber,
  readFormSchema,
  toFormValues,
  type ExactMemory,
  type NumericField,
  type ReadFormValues,
} from "../utils/read-form";
import { encodeReadQuery, type ReadValues } from "../../../lib/read-url";
import { DirectionDial } from "./direction-dial";
import { MeasureOnGreen, type Measured } from "../../../components/measure/measure-on-green";

/** The eight named directions placed as the golfer sees them: away (downhill) on top, toward them below, the hole in the middle. */
const PICKER_LAYOUT: ReadonlyArray<number | null> = [315, 0, 45, 270, null, 90, 225, 180, 135];

/** How long typing may pause before the read is worked out again. */
export const SOLVE_DEBOUNCE_MS = 400;

export type ReadFormProps = {
  units: UnitSystem;
  /** The committed read (from the URL). When it changes from outside (a link, back/forward), the form follows. */
  values: ReadValues;
  /** Valid values, after a pause in typing, on submit, or when the dial is let go. */
  onCommit: (values: ReadValues) => void;
  /** While the dial is dragged: the values to preview (null when the drag ends or a field is invalid). */
  onLive?: (values: ReadValues | null) => void;
  /** Errors the API sent back, by form field. */
  serverErrors?: Partial<Record<NumericField, string>>;
  /** A note under the slope (e.g. the steepest slope a ball stops on at this Stimp). */
  slopeNote?: string;
  solving?: boolean;
  /** What is wrong with the form's values now (messages in the user's units), or null when they can be read. */
  onProblems?: (problems: string[] | null) => void;
};

function unitLabel(field: NumericField, units: UnitSystem): string {
  return fieldLimits(field, units).unit;
}

export function ReadForm({ units, values, onCommit, onLive, serverErrors = {}, slopeNote, solving, onProblems }: ReadFormProps) {
  const ids = { dial: useId(), degrees: useId(), dialHelp: useId() };
  const [initial] = useState(() => toFormValues(values, units));
  // The units the form's text is written in, and the exact SI values behind that text.
  const textUnits = useRef<UnitSystem>(units);
  const memory = useRef<ExactMemory>(initial.memory);
  const lastCommitted = useRef(encodeReadQuery(values));

  // The schema follows the units prop; a units switch rewrites the text before anything is validated again.
  const { register, handleSubmit, control, getValues, setValue, reset, trigger, formState } = useForm<ReadFormValues>({
    resolver: zodResolver(readFormSchema(units)),
    mode: "onTouched",
    defaultValues: initial.values,
  });
  const errors: FieldErrors<ReadFormValues> = formState.errors;
  // A registered field with its first value written into the HTML too: the page drawn at build time
  // (src/prerender.tsx) shows the read's values before any script runs, not empty boxes.
  const field = <K extends "distance" | "slope" | "stimp" | "rollPast" | "fallLine" | "entrySpeed">(name: K) => ({
    ...register(name),
    defaultValue: initial.values[name],
  });

  const currentSi = useCallback(() => fromFormValues(getValues(), textUnits.current, memory.current), [getValues]);
  const isValid = useCallback(() => readFormSchema(textUnits.current).safeParse(getValues()).success, [getValues]);

  const commit = useCallback(() => {
    const si = currentSi();
    lastCommitted.current = encodeReadQuery(si);
    onCommit(si);
  }, [currentSi, onCommit]);
  const debounced = useDebouncedCallback(() => {
    if (isValid()) commit();
  }, SOLVE_DEBOUNCE_MS);

  // Typing: work the read out again after a pause. Not while the dial is held: the drag is previewed in the browser
  // and committed on release, so a pause mid-drag (or a slow first load of the engine) asks the server nothing.
  const watched = useWatch({ control });
  const firstWatch = useRef(true);
  const dialHeld = useRef(false);
  useEffect(() => {
    if (firstWatch.current) {
      firstWatch.current = false;
      return;
    }
    if (dialHeld.current) return;
    debounced.call();
  }, [watched, debounced]);

  // The page greys out an answer that no longer matches the form, at once, and says why.
  const lastProblems = useRef<string | null>(null);
  useEffect(() => {
    if (!onProblems) return;
    const parsed = readFormSchema(textUnits.current).safeParse(getValues());
    const problems = parsed.success ? null : [...new Set(parsed.error.issues.map((i) => i.message))];
    const key = problems ? problems.join("|") : null;
    if (key === lastProblems.current) return;
    lastProblems.current = key;
    onProblems(problems);
  }, [watched, units, getValues, onProblems]);

  // Units switched: rewrite every field in the new units from the exact SI values behind it.
  useLayoutEffect(() => {
    if (textUnits.current === units) return;
    const next = convertFormValues(getValues(), textUnits.current, units, memory.current);
    textUnits.current = units;
    memory.current = next.memory;
    reset(next.values, { keepTouched: true, keepDirty: true });
    if (Object.keys(formState.errors).length > 0) void trigger();
    // formState.errors is read only to decide whether to re-check; its changes must not re-run the conversion.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [units, getValues, reset, trigger]);

  // The URL changed under us (a shared link, a saved read, back/forward): show that read.
  useEffect(() => {
    const q = encodeReadQuery(values);
    if (q === lastCommitted.current) return;
    lastCommitted.current = q;
    debounced.cancel();
    const next = toFormValues(values, textUnits.current);
    memory.current = next.memory;
    reset(next.values);
    void trigger();
  }, [values, reset, trigger, debounced]);

  // A link with values out of range shows its messages at once.
  useEffect(() => {
    if (!readFormSchema(textUnits.current).safeParse(getValues()).success) void trigger();
  }, [getValues, trigger]);

  const setDirection = (deg: number, done: boolean) => {
    const text = formatNumber(deg, 0);
    memory.current = { ...memory.current, fallLine: { text, si: normaliseDeg(deg) } };
    setValue("fallLine", text, { shouldValidate: true, shouldDirty: true, shouldTouch: true });
    dialHeld.current = !done;
    if (!done) {
      onLive?.(isValid() ? currentSi() : null);
      return;
    }
    onLive?.(null);
    debounced.cancel();
    if (isValid()) commit();
  };

  // Measured with the phone: both fields take the exact values (shown rounded) and the read is worked out at once.
  const setMeasured = (m: Measured) => {
    const slopeText = formatNumber(m.slopePct, 1);
    const fallText = formatNumber(m.fallLineDeg, 0);
    memory.current = {
      ...memory.current,
      slope: { text: slopeText, si: m.slopePct },
      fallLine: { text: fallText, si: normaliseDeg(m.fallLineDeg) },
    };
    setValue("slope", slopeText, { shouldValidate: true, shouldDirty: true, shouldTouch: true });
    setValue("fallLine", fallText, { shouldValidate: true, shouldDirty: true, shouldTouch: true });
    debounced.cancel();
    if (isValid()) commit();
  };

  const paceMode = watched.paceMode ?? "rollPast";
  const fallLineText = watched.fallLine ?? "";
  const dialDeg = parseNumber(fallLineText);
  const err = (field: NumericField) => errors[field]?.message ?? serverErrors[field];
  const limitsHint = (field: NumericField) => {
    const l = fieldLimits(field, units);
    return `${l.min}–${l.max} ${l.unit}`;
  };

  return (
    <form
      noValidate
      aria-label="The putt"
      onSubmit={(event) => {
        debounced.cancel();
        void handleSubmit(() => commit())(event);
      }}
      className="flex flex-col gap-6"
    >
      <div className="grid grid-cols-2 gap-x-3 gap-y-4">
        <InputField
          label={`Distance (${unitLabel("distance", units)})`}
          inputMode="decimal"
          autoComplete="off"
          hint="Ball to hole"
          error={err("distance")}
          {...field("distance")}
        />
        <InputField
          label="Slope (%)"
          inputMode="decimal"
          autoComplete="off"
          hint={slopeNote ?? "Most greens: 1–3 %"}
          error={err("slope")}
          {...field("slope")}
        />
        <InputField
          label="Stimp (ft)"
          inputMode="decimal"
          autoComplete="off"
          hint={`Green speed, ${limitsHint("stimp")}`}
          error={err("stimp")}
          {...field("stimp")}
        />
        <InputField
          label={`Past the hole (${unitLabel("rollPast", units)})`}
          inputMode="decimal"
          autoComplete="off"
          hint={paceMode === "entrySpeed" ? "Pace set by entry speed below" : "Where it stops if it misses"}
          error={paceMode === "rollPast" ? err("rollPast") : undefined}
          readOnly={paceMode === "entrySpeed"}
          className={paceMode === "entrySpeed" ? "opacity-50" : undefined}
          {...field("rollPast")}
        />
      </div>
      <MeasureOnGreen onMeasured={setMeasured} />

      <section aria-labelledby={`${ids.dial}-h`} className="flex flex-col gap-4">
        <div>
          <h2 id={`${ids.dial}-h`} className="text-sm font-medium text-ink-800">
            Which way the green falls
          </h2>
          <p id={ids.dialHelp} className="text-sm text-ink-500">
            Drag the handle to where the ground runs down to, or use the arrow keys.
            {Number.isFinite(dialDeg) ? <span className="font-medium text-ink-800"> Now: {describeFallLine(dialDeg)}.</span> : null}
          </p>
        </div>
        <div className="grid items-start gap-5 sm:grid-cols-[minmax(0,15rem)_1fr] lg:grid-cols-1">
          <div className="mx-auto w-full max-w-60">
            <DirectionDial id={ids.dial} value={dialDeg} onChange={setDirection} describedBy={ids.dialHelp} />
          </div>
          <div className="flex flex-col gap-4">
            <fieldset>
              <legend className="mb-2 text-sm font-medium text-ink-800">Or pick one (top row: the green falls away from you)</legend>
              <div className="grid grid-cols-3 gap-1.5">
                {PICKER_LAYOUT.map((deg) => {
                  if (deg === null) {
                    return (
                      <span key="hole" aria-hidden="true" className="flex items-center justify-center">
                        <span className="size-4 rounded-full border-2 border-ink-900/40 bg-ink-900" />
                      </span>
                    );
                  }
                  const d = NAMED_DIRECTIONS.find((n) => n.deg === deg);
                  if (!d) return null;
                  const checked = Number.isFinite(dialDeg) && normaliseDeg(dialDeg) === d.deg;
                  return (
                    <label
                      key={d.deg}
                      className={clsx(
                        "relative flex min-h-12 cursor-pointer items-center justify-center rounded-xl border-2 px-1.5 py-1 text-center text-[13px] leading-tight transition-colors has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-coral-500",
                        checked
                          ? "border-ink-900 bg-ink-900 text-sand-50"
                          : "border-ink-900/15 bg-white text-ink-800 hover:border-ink-900/30",
                      )}
                    >
                      <input
                        type="radio"
                        name="named-direction"
                        className="sr-only"
                        checked={checked}
                        onChange={() => setDirection(d.deg, true)}
                      />
                      {d.label}
                    </label>
                  );
                })}
              </div>
            </fieldset>
            <InputField
              id={ids.degrees}
              label="Or type degrees"
              inputMode="numeric"
              autoComplete="off"
              hint="0 straight downhill, 90 falls right, 180 uphill, 270 falls left"
              error={err("fallLine")}
              containerClassName="max-w-xs"
              {...field("fallLine")}
            />
          </div>
        </div>
      </section>

      <details className="group rounded-xl border-2 border-ink-900/10 bg-white/60 px-4 py-3" open={paceMode === "entrySpeed" || undefined}>
        <summary className="flex min-h-9 cursor-pointer items-center text-sm font-medium text-ink-800">
          More: set the pace by entry speed
        </summary>
        <div className="mt-3 flex flex-col gap-3">
          <p className="text-sm text-ink-500">
            For the curious: the ball&apos;s speed as it reaches the hole, in metres per second. Most golfers are better served by the
            distance past.
          </p>
          <label className="flex min-h-11 items-center gap-3 text-sm font-medium text-ink-800">
            <input
              type="checkbox"
              className="size-5 accent-ink-900"
              checked={paceMode === "entrySpeed"}
              onChange={(e) => setValue("paceMode", e.target.checked ? "entrySpeed" : "rollPast", { shouldDirty: true })}
            />
            Use entry speed instead of the distance past
          </label>
          <InputField
            label={`Entry speed (${FIELD_SPECS.entrySpeed.unit(units)})`}
            inputMode="decimal"
            autoComplete="off"
            hint={limitsHint("entrySpeed")}
            readOnly={paceMode !== "entrySpeed"}
            className={paceMode !== "entrySpeed" ? "opacity-50" : undefined}
            error={paceMode === "entrySpeed" ? err("entrySpeed") : undefined}
            containerClassName="max-w-xs"
            {...field("entrySpeed")}
          />
        </div>
      </details>

      <Button type="submit" variant="primary" size="lg" loading={solving} loadingText="Working out the read…" className="sm:self-start">
        Read the putt
      </Button>
    </form>
  );
}
