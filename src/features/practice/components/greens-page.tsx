import { formatDate, stimpText } from "#shared/format";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Link, useNavigate } from "react-router";
import { z } from "zod";
import { Alert, Button, Card, CardTitle, EmptyState, InputField, PageHeader, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { errorMessage } from "../../../lib/query-client";
import { useCreateGreen } from "../api/create-green";
import { useGreens } from "../api/get-greens";

const newGreenSchema = z.object({
  name: z.string().trim().min(1, "Give the green a name").max(80, "At most 80 characters"),
  locationNote: z.string().trim().max(500, "At most 500 characters"),
});
type NewGreen = z.infer<typeof newGreenSchema>;

function NewGreenForm() {
  const create = useCreateGreen();
  const navigate = useNavigate();
  const { register, handleSubmit, formState, reset } = useForm<NewGreen>({
    resolver: zodResolver(newGreenSchema),
    defaultValues: { name: "", locationNote: "" },
  });
  const fields = isApiError(create.error) ? create.error.fields : {};
  return (
    <Card>
      <CardTitle>Add a green</CardTitle>
      <form
        noValidate
        aria-label="Add a green"
        className="mt-4 grid items-start gap-4 sm:grid-cols-[1fr_1fr_auto]"
        onSubmit={(e) =>
          void handleSubmit((v) =>
            create.mutate(
              { name: v.name, locationNote: v.locationNote || null },
              {
                onSuccess: (g) => {
                  reset();
                  void navigate(paths.green.href(g.id));
                },
              },
            ),
          )(e)
        }
      >
        <InputField
          label="Name"
          placeholder="e.g. Practice green by the first tee"
          error={formState.errors.name?.message ?? fields.name}
          {...register("name")}
        />
        <InputField
          label="Where (optional)"
          placeholder="Club, course"
          error={formState.errors.locationNote?.message ?? fields.locationNote}
          {...register("locationNote")}
        />
        <Button type="submit" loading={create.isPending} loadingText="Adding…" className="sm:mt-7">
          Add green
        </Button>
      </form>
      {create.isError && Object.keys(fields).length === 0 ? (
        <Alert tone="error" className="mt-3">
          {errorMessage(create.error)}
        </Alert>
      ) : null}
    </Card>
  );
}

/** The player's greens and those shared with their squads, with their current Stimp; add one here, open one to rename it or add readings. */
export function GreensPage() {
  const greens = useGreens();
  return (
    <div className="flex flex-col gap-6">
      <title>Greens · Borrowline</title>
      <PageHeader
        eyebrow="Practice log"
        title="Greens"
        description="The putting surfaces you practise on, yours and your squad’s, with their measured speed. A session on a green starts from its latest Stimp."
      />
      {greens.isPending ? <PageSpinner label="Loading your greens" /> : null}
      {greens.isError ? (
        <Alert tone="error" title="Could not load your greens">
          {errorMessage(greens.error)}
        </Alert>
      ) : null}
      {greens.data && greens.data.items.length === 0 ? (
        <EmptyState title="No greens yet">
          Add the practice green you use most; measure its speed with a Stimpmeter when you can. A green your coach shares with your squad
          shows here too.
        </EmptyState>
      ) : null}
      {greens.data && greens.data.items.length > 0 ? (
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Your greens">
          {greens.data.items.map((g) => (
            <li key={g.id}>
              <Link
                to={paths.green.href(g.id)}
                className="flex min-h-24 flex-col justify-between gap-2 rounded-(--radius-card) bg-sand-50 p-4 ring-1 ring-ink-900/10 transition-colors hover:ring-ink-900/30 focus-visible:outline-3 focus-visible:outline-coral-500"
              >
                <span className="flex flex-col gap-0.5">
                  <span className="text-lg font-semibold">{g.name}</span>
                  {g.squad ? (
                    <span className="text-sm text-ink-600">
                      {g.mine ? `Shared with ${g.squad.name}` : `Shared with ${g.squad.name} by ${g.ownerName}`}
                    </span>
                  ) : null}
                </span>
                <span className="flex items-baseline justify-between gap-2 text-sm text-ink-500">
                  <span className="truncate">{g.locationNote ?? `Added ${formatDate(g.createdAt.slice(0, 10))}`}</span>
                  <span className="shrink-0 font-medium text-ink-800">
                    {g.currentStimpFt !== null ? stimpText(g.currentStimpFt) : "no reading yet"}
                  </span>
                </span>
              </Link>
            </li>
          ))}
        </ul>
      ) : null}
      <NewGreenForm />
    </div>
  );
}
