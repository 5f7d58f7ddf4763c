import { TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { AuthLayout } from "../../../features/auth/components/auth-layout";
import { ForgotPasswordForm } from "../../../features/auth/components/forgot-password-form";

export function ForgotPasswordRoute() {
  return (
    <AuthLayout
      title="Forgot your password?"
      description="Enter the e-mail you signed up with and we will send a link to choose a new one."
      footer={<TextLink to={paths.signIn.href()}>Back to sign in</TextLink>}
    >
      <title>Forgot password · Borrowline</title>
      <ForgotPasswordForm />
    </AuthLayout>
  );
}

export { ForgotPasswordRoute as Component };
