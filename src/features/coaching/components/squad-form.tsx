import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { squadInputSchema, type SquadInput } from "#shared/schemas/squads";
import { Alert, Button, InputField } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";

export type SquadFormProps = {
  defaultValues?: { name: string; description: string | null };
  submitLabel: string;
  pendingLabel: string;
  onSubmit: (input: SquadInput) => Promise<unknown>;
  onCancel?: () => void;
};

/** Name and description of a squad, checked with the shared schema; server field errors land on the fields. */
export function SquadForm({ defaultValues, submitLabel, pendingLabel, onSubmit, onCancel }: SquadFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof squadInputSchema>, unknown, SquadInput>({
    resolver: zodResolver(squadInputSchema),
    defaultValues: { name: defaultValues?.name ?? "", description: defaultValues?.description ?? "" },
  });

  const submit = async (input: SquadInput) => {
    try {
      await onSubmit({ name: input.name, ...(input.description ? { description: input.description } : {}) });
      if (!defaultValues) reset();
    } catch (error) {
      const fields = isApiError(error) ? error.fields : {};
      if (fields.name) setError("name", { type: "server", message: fields.name });
      else if (fields.description) setError("description", { type: "server", message: fields.description });
      else setError("root", { type: "server", message: isApiError(error) ? error.message : "Could not save the squad." });
    }
  };

  return (
    <form noValidate onSubmit={handleSubmit(submit)} className="flex flex-col gap-4" aria-label={submitLabel}>
      {errors.root?.message ? <Alert tone="error">{errors.root.message}</Alert> : null}
      <InputField label="Squad name" autoComplete="off" error={errors.name?.message} {...register("name")} />
      <InputField
        label="Description (optional)"
        hint="Who is in it and when you meet, e.g. Saturday juniors."
        autoComplete="off"
        error={errors.description?.message}
        {...register("description")}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" loading={isSubmitting} loadingText={pendingLabel}>
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
