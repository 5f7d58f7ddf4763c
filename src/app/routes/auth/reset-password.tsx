import { useSearchParams } from "react-router";
import { TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { AuthLayout } from "../../../features/auth/components/auth-layout";
import { ResetPasswordForm } from "../../../features/auth/components/reset-password-form";

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <AuthLayout title="Choose a new password" footer={<TextLink to={paths.signIn.href()}>Back to sign in</TextLink>}>
      <title>New password · Borrowline</title>
      <ResetPasswordForm token={params.get("token")} linkError={params.get("error")} />
    </AuthLayout>
  );
}

export { ResetPasswordRoute as Component };
