import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useNavigate } from "react-router";
import { z } from "zod";
import { toast } from "../../../lib/toast";
import { Alert, Button, ButtonLink, InputField } from "../../../components/ui";
import { authClient } from "../../../lib/auth-client";
import { paths } from "../../../config/paths";
import { describeAuthError } from "../utils/auth-errors";

export const resetPasswordSchema = z
  .object({
    newPassword: z.string().min(8, "Use at least 8 characters.").max(128, "Use at most 128 characters."),
    confirmPassword: z.string().min(1, "Type the new password again."),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { path: ["confirmPassword"], message: "The two passwords are not the same." });

type ResetPasswordValues = z.output<typeof resetPasswordSchema>;

export type ResetPasswordFormProps = {
  /** From `?token=`; absent or rejected tokens show a way to ask for a new link. */
  token: string | null;
  /** better-auth redirects here with `?error=INVALID_TOKEN` when the link was bad. */
  linkError?: string | null;
};

function BadLink({ message }: { message: string }) {
  return (
    <div className="flex flex-col gap-5">
      <Alert tone="error">{message}</Alert>
      <ButtonLink to={paths.forgotPassword.href()} variant="secondary" size="lg" fullWidth>
        Ask for a new link
      </ButtonLink>
    </div>
  );
}

export function ResetPasswordForm({ token, linkError }: ResetPasswordFormProps) {
  const navigate = useNavigate();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof resetPasswordSchema>, unknown, ResetPasswordValues>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { newPassword: "", confirmPassword: "" },
  });

  if (linkError) return <BadLink message="This reset link is not valid any more. Links work once and expire after a while." />;
  if (!token) return <BadLink message="This page needs the link from your reset e-mail. Open the link again, or ask for a new one." />;

  const onSubmit = async ({ newPassword }: ResetPasswordValues) => {
    setFormError(null);
    try {
      const { error } = await authClient.resetPassword({ newPassword, token });
      if (error) {
        const described = describeAuthError(error, "Could not change the password. Please try again.");
        if (described.field === "password" || described.field === "newPassword") {
          setError("newPassword", { type: "server", message: described.message }, { shouldFocus: true });
        } else {
          setFormError(described.message);
        }
        return;
      }
      toast.success("Password changed. Sign in with your new password.");
      await navigate(paths.signIn.href(), { replace: true });
    } catch {
      setFormError("Could not reach Borrowline. Check your connection and try again.");
    }
  };

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-5" aria-label="Choose a new password">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <InputField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.newPassword?.message}
        {...register("newPassword")}
      />
      <InputField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.confirmPassword?.message}
        {...register("confirmPassword")}
      />
      <Button type="submit" size="lg" fullWidth loading={isSubmitting} loadingText="Saving…">
        Save new password
      </Button>
    </form>
  );
}
