import { TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { AuthLayout } from "../../../features/auth/components/auth-layout";
import { SignInForm } from "../../../features/auth/components/sign-in-form";
import { useSearchParams } from "react-router";

export function SignInRoute() {
  const [params] = useSearchParams();
  const next = params.get("next") ?? undefined;
  return (
    <AuthLayout
      title="Sign in"
      description="Welcome back. Your greens, sessions and ladders are waiting."
      footer={
        <>
          New to Borrowline? <TextLink to={paths.signUp.href(next)}>Create an account</TextLink>
        </>
      }
    >
      <title>Sign in · Borrowline</title>
      <SignInForm />
    </AuthLayout>
  );
}

export { SignInRoute as Component };
