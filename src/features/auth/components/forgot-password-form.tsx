import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { Alert, Button, InputField } from "../../../components/ui";
import { authClient } from "../../../lib/auth-client";
import { paths } from "../../../config/paths";
import { describeAuthError } from "../utils/auth-errors";

export const forgotPasswordSchema = z.object({
  email: z.string().trim().min(1, "Enter your e-mail address.").pipe(z.email("Enter a valid e-mail address.")),
});

type ForgotPasswordValues = z.output<typeof forgotPasswordSchema>;

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof forgotPasswordSchema>, unknown, ForgotPasswordValues>({
    resolver: zodResolver(forgotPasswordSchema),
    defaultValues: { email: "" },
  });

  const onSubmit = async ({ email }: ForgotPasswordValues) => {
    setFormError(null);
    try {
      const { error } = await authClient.requestPasswordReset({ email, redirectTo: paths.resetPassword.href() });
      if (error) {
        setFormError(describeAuthError(error, "Could not send the link. Please try again.").message);
        return;
      }
      setSentTo(email);
    } catch {
      setFormError("Could not reach Borrowline. Check your connection and try again.");
    }
  };

  if (sentTo) {
    return (
      <Alert tone="success" title="Check your inbox">
        If an account uses <strong className="font-semibold break-all">{sentTo}</strong>, a link to choose a new password is on its way. It
        works once and expires after a while.
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-5" aria-label="Ask for a password reset link">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <InputField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register("email")} />
      <Button type="submit" size="lg" fullWidth loading={isSubmitting} loadingText="Sending…">
        Send me a reset link
      </Button>
    </form>
  );
}
