import type { ReactNode } from "react";
import { Navigate, useLocation } from "react-router";
import { Alert, Button, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useMe, type Me, type Role } from "../api/get-me";

export type RequireAuthProps = {
  children: ReactNode | ((me: Me) => ReactNode);
  /** Hides the page from other roles. This only hides: the server decides what anyone may do. */
  roles?: ReadonlyArray<Role>;
};

/** Renders its children for a signed-in user; sends anyone else to sign in, then back here. */
export function RequireAuth({ children, roles }: RequireAuthProps) {
  const location = useLocation();
  const me = useMe();

  if (me.isPending) return <PageSpinner label="Checking your account" />;
  if (me.isError) {
    return (
      <>
        <h1 className="sr-only">Your account</h1>
        <Alert
          tone="error"
          title="Could not check your account"
          action={
            <Button size="sm" variant="secondary" onClick={() => void me.refetch()}>
              Try again
            </Button>
          }
        >
          {me.error.message}
        </Alert>
      </>
    );
  }
  if (!me.data) return <Navigate to={paths.signIn.href(`${location.pathname}${location.search}`)} replace />;
  if (roles && !roles.includes(me.data.user.role)) {
    return (
      <>
        <h1 className="mb-4 text-2xl font-semibold text-ink-900">Not part of your account</h1>
        <Alert tone="info">This page is for {roles.join(" or ")} accounts.</Alert>
      </>
    );
  }
  return <>{typeof children === "function" ? children(me.data) : children}</>;
}
