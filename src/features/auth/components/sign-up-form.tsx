import { useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { signUpSchema, type SignUpValues } from "#shared/schemas/auth";
import type { SignUpRole } from "#shared/roles";
import { toast } from "../../../lib/toast";
import { Alert, Button, ChoiceGroup, InputField } from "../../../components/ui";
import { authClient } from "../../../lib/auth-client";
import { describeAuthError } from "../utils/auth-errors";
import { useAfterSignIn } from "../hooks/use-after-sign-in";
import { authKeys } from "../api/keys";

type SignUpInput = Parameters<typeof authClient.signUp.email>[0];

const roleChoices = [
  { value: "player", label: "I am a player", description: "Read putts, log practice, run the ladders your coach sets." },
  { value: "coach", label: "I am a coach", description: "Everything a player can do, plus squads and ladders." },
] as const;

export type SignUpFormProps = {
  /** Where the e-mail confirmation link brings the person back to (an invitation's join page). */
  callbackURL?: string;
  /** Prefills the e-mail (an invitation's address). */
  defaultEmail?: string;
  /** Fixes the account type and leaves out the choice (an invitation to a squad is for a player). */
  role?: SignUpRole;
  /** Runs once the account exists and the current user is refreshed, instead of going to `?next=` or home. */
  onSignedUp?: () => Promise<void> | void;
};

export function SignUpForm({ defaultEmail = "", role, onSignedUp, callbackURL }: SignUpFormProps = {}) {
  const afterSignIn = useAfterSignIn();
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof signUpSchema>, unknown, SignUpValues>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: "", email: defaultEmail, password: "", ...(role ? { role } : {}) },
  });

  const onSubmit = async ({ name, email, password, role }: SignUpValues) => {
    setFormError(null);
    try {
      // The server takes the chosen role as `accountType` (an extra user field); the client types do not know it.
      const { data, error } = await authClient.signUp.email({
        name,
        email,
        password,
        accountType: role,
        ...(callbackURL ? { callbackURL } : {}),
      } as SignUpInput);
      if (error) {
        const described = describeAuthError(error, "Could not create the account. Please try again.");
        if (
          described.field === "name" ||
          described.field === "email" ||
          described.field === "password" ||
          (described.field as string) === "accountType"
        ) {
          setError(
            (described.field as string) === "accountType" ? "role" : (described.field as "name" | "email" | "password"),
            { type: "server", message: described.message },
            { shouldFocus: true },
          );
        } else {
          setFormError(described.message);
        }
        return;
      }
      toast.success(
        data?.token ? `Welcome to Borrowline, ${name}.` : "Account created. Check your inbox to confirm your e-mail, then sign in.",
      );
      if (onSignedUp) {
        await queryClient.invalidateQueries({ queryKey: authKeys.all });
        await onSignedUp();
      } else {
        await afterSignIn();
      }
    } catch {
      setFormError("Could not reach Borrowline. Check your connection and try again.");
    }
  };

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-5" aria-label="Create an account">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <InputField label="Name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <InputField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
      <InputField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.password?.message}
        {...register("password")}
      />
      {role ? (
        <p className="text-sm text-ink-600">{roleChoices.find((c) => c.value === role)?.description}</p>
      ) : (
        <ChoiceGroup
          legend="How will you use Borrowline?"
          choices={roleChoices}
          error={errors.role?.message}
          inputProps={register("role")}
        />
      )}
      <Button type="submit" size="lg" fullWidth loading={isSubmitting} loadingText="Creating your account…">
        Create account
      </Button>
    </form>
  );
}
