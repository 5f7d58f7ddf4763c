import { useSearchParams } from "react-router";
import { TextLink } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { AuthLayout } from "../../../features/auth/components/auth-layout";
import { SignUpForm } from "../../../features/auth/components/sign-up-form";

export function SignUpRoute() {
  const [params] = useSearchParams();
  const next = params.get("next") ?? undefined;
  return (
    <AuthLayout
      title="Create your account"
      description="The read calculator works without one; an account keeps your greens, practice and ladders."
      footer={
        <>
          Already have an account? <TextLink to={paths.signIn.href(next)}>Sign in</TextLink>
        </>
      }
    >
      <title>Create an account · Borrowline</title>
      <SignUpForm />
    </AuthLayout>
  );
}

export { SignUpRoute as Component };
