import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { Alert, Button, InputField, TextLink } from "../../../components/ui";
import { authClient } from "../../../lib/auth-client";
import { paths } from "../../../config/paths";
import { describeAuthError } from "../utils/auth-errors";
import { useAfterSignIn } from "../hooks/use-after-sign-in";

export const signInSchema = z.object({
  email: z.string().trim().min(1, "Enter your e-mail address.").pipe(z.email("Enter a valid e-mail address.")),
  password: z.string().min(1, "Enter your password."),
});

export type SignInValues = z.output<typeof signInSchema>;

export function SignInForm() {
  const afterSignIn = useAfterSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof signInSchema>, unknown, SignInValues>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: "", password: "" },
  });

  const onSubmit = async ({ email, password }: SignInValues) => {
    setFormError(null);
    try {
      const { error } = await authClient.signIn.email({ email, password });
      if (error) {
        const described = describeAuthError(error, "Could not sign in. Please try again.");
        if (described.field === "email" || described.field === "password") {
          setError(described.field, { type: "server", message: described.message }, { shouldFocus: true });
        } else {
          setFormError(described.message);
        }
        return;
      }
      await afterSignIn();
    } catch {
      setFormError("Could not reach Borrowline. Check your connection and try again.");
    }
  };

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-5" aria-label="Sign in">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <InputField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
      <div className="flex flex-col gap-2">
        <InputField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...register("password")}
        />
        <TextLink to={paths.forgotPassword.href()} className="self-end text-sm">
          Forgot your password?
        </TextLink>
      </div>
      <Button type="submit" size="lg" fullWidth loading={isSubmitting} loadingText="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
