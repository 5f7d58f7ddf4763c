import { formatStimp, stimpText } from "#shared/format";
import { useEffect, useRef } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useNavigate } from "react-router";
import { z } from "zod";
import { STIMP_LIMITS } from "#shared/schemas/greens";
import { Alert, Button, Card, CardTitle, InputField, SelectField, TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useCreateSession } from "../api/create-session";
import { useGreens } from "../api/get-greens";
import { useSessions } from "../api/get-sessions";
import { todayIso } from "../utils/dates";
import { parseDecimal } from "#shared/units";

export const SESSION_TAGS = ["damp", "dry", "windy", "after mowing", "after rolling", "hollow-tined"] as const;

const isStimp = (ft: number | null) => ft !== null && ft >= STIMP_LIMITS.minFt && ft <= STIMP_LIMITS.maxFt;

const formSchema = z.object({
  date: z.iso.date({ message: "Choose the day" }),
  greenId: z.string(),
  stimp: z
    .string()
    .trim()
    .refine((v) => v === "" || isStimp(parseDecimal(v)), {
      message: `A Stimp between ${STIMP_LIMITS.minFt} and ${STIMP_LIMITS.maxFt} ft, or leave it empty`,
    }),
  conditions: z.string().trim().max(200, "At most 200 characters"),
  tags: z.array(z.string()),
  notes: z.string().trim().max(2000, "At most 2000 characters"),
});
type FormValues = z.infer<typeof formSchema>;

/** Start a session: the day, the green (its latest Stimp is the default), conditions, tags and notes. */
export function StartSessionForm() {
  const greens = useGreens();
  // GET /api/greens lists the player's own greens and those shared with their squads; the latest session's is the likely one.
  const recent = useSessions({ page: 1, pageSize: 50, sort: "-date" });
  const create = useCreateSession();
  const navigate = useNavigate();
  const { register, handleSubmit, formState, control, setValue, getValues } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { date: todayIso(), greenId: "", stimp: "", conditions: "", tags: [], notes: "" },
  });

  // Choosing a green fills in its current Stimp (the player may still change it).
  const greenId = useWatch({ control, name: "greenId" });
  const lastGreen = useRef("");
  useEffect(() => {
    if (greenId === lastGreen.current) return;
    lastGreen.current = greenId;
    const g = greens.data?.items.find((x) => x.id === greenId);
    setValue("stimp", g?.currentStimpFt != null ? formatStimp(g.currentStimpFt) : "", { shouldValidate: false });
  }, [greenId, greens.data, setValue]);

  // The green of the latest session (or a single own green) is the likely one: pick it.
  const listed = new Set(greens.data?.items.map((g) => g.id) ?? []);
  const likely =
    recent.data?.items.find((x) => x.greenId && listed.has(x.greenId))?.greenId ??
    (greens.data?.items.length === 1 ? greens.data.items[0]!.id : null);
  useEffect(() => {
    if (likely && getValues("greenId") === "") setValue("greenId", likely);
  }, [likely, getValues, setValue]);

  const submit = handleSubmit((v) => {
    const stimp = parseDecimal(v.stimp) ?? undefined;
    create.mutate(
      {
        date: v.date,
        greenId: v.greenId || null,
        // Without a Stimp the server takes the green's latest reading on or before that day.
        ...(stimp !== undefined ? { stimpFt: stimp } : {}),
        conditions: v.conditions || null,
        tags: v.tags,
        notes: v.notes || null,
      },
      { onSuccess: ({ id }) => void navigate(paths.session.href(id)) },
    );
  });

  const fieldErrors = isApiError(create.error) ? create.error.fields : {};
  const own = greens.data?.items ?? [];
  const greenOptions = [
    { value: "", label: greens.isPending ? "Loading greens…" : "No particular green" },
    ...own.map((g) => {
      // A squad's green names its squad first: on a phone the end of a long option is cut off (the Stimp field shows it).
      const name = g.mine || !g.squad ? g.name : `${g.name}, ${g.squad.name}`;
      return { value: g.id, label: g.currentStimpFt != null ? `${name} (${stimpText(g.currentStimpFt)})` : name };
    }),
  ];

  return (
    <Card>
      <CardTitle>Start a session</CardTitle>
      <form noValidate onSubmit={(e) => void submit(e)} className="mt-4 flex flex-col gap-4" aria-label="Start a session">
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <InputField label="Day" type="date" error={formState.errors.date?.message ?? fieldErrors.date} {...register("date")} />
          <SelectField
            label="Green"
            containerClassName="order-last col-span-2 sm:order-none sm:col-span-1"
            options={greenOptions}
            error={fieldErrors.greenId}
            hint={
              greens.data && own.length === 0 ? (
                <>
                  No greens yet. <TextLink to={paths.greens.href()}>Add one</TextLink> to keep its Stimp.
                </>
              ) : undefined
            }
            {...register("greenId")}
          />
          <InputField
            label="Stimp (ft)"
            inputMode="decimal"
            autoComplete="off"
            placeholder="e.g. 9.5"
            hint={
              // On a phone the hint would push "Start logging" below the fold; it is a refinement, not a step.
              <span className="hidden sm:inline">
                {greenId ? "The green’s latest reading; change it if you measured today." : "Optional"}
              </span>
            }
            error={formState.errors.stimp?.message ?? fieldErrors.stimpFt}
            {...register("stimp")}
          />
        </div>
        <details className="group rounded-xl border-2 border-ink-900/10 bg-white/60 px-4 py-1 open:pb-4">
          <summary className="flex min-h-12 cursor-pointer items-center font-medium text-ink-800">
            Conditions, tags and notes (optional)
          </summary>
          <div className="mt-2 flex flex-col gap-4">
            <InputField
              label="Conditions"
              placeholder="e.g. firm after a dry week, light breeze"
              error={formState.errors.conditions?.message ?? fieldErrors.conditions}
              {...register("conditions")}
            />
            <Controller
              control={control}
              name="tags"
              render={({ field }) => (
                <fieldset>
                  <legend className="mb-2 text-sm font-medium text-ink-800">Tags</legend>
                  <div className="flex flex-wrap gap-2">
                    {SESSION_TAGS.map((tag) => {
                      const on = field.value.includes(tag);
                      return (
                        <button
                          key={tag}
                          type="button"
                          aria-pressed={on}
                          onClick={() => field.onChange(on ? field.value.filter((t) => t !== tag) : [...field.value, tag])}
                          className={
                            on
                              ? "min-h-11 rounded-full border-2 border-ink-900 bg-ink-900 px-4 text-sm font-medium text-sand-50"
                              : "min-h-11 rounded-full border-2 border-ink-900/15 bg-white px-4 text-sm font-medium text-ink-800 hover:border-ink-900/30"
                          }
                        >
                          {tag}
                        </button>
                      );
                    })}
                  </div>
                </fieldset>
              )}
            />
            <div className="flex flex-col gap-1.5">
              <label htmlFor="session-notes" className="text-sm font-medium text-ink-800">
                Notes
              </label>
              <textarea
                id="session-notes"
                rows={3}
                className="block w-full rounded-xl border-2 border-ink-900/15 bg-white px-4 py-3 text-base focus:border-ink-700 focus:outline-none"
                {...register("notes")}
              />
              {formState.errors.notes ? <p className="text-sm font-medium text-bad-600">{formState.errors.notes.message}</p> : null}
            </div>
          </div>
        </details>
        {create.isError && Object.keys(fieldErrors).length === 0 ? <Alert tone="error">{errorMessage(create.error)}</Alert> : null}
        <Button type="submit" variant="accent" size="lg" loading={create.isPending} loadingText="Starting…" className="sm:self-start">
          Start logging
        </Button>
      </form>
    </Card>
  );
}
