import clsx from "clsx";
import { Link } from "react-router";
import { Button, buttonClasses } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { useMe } from "../api/get-me";
import { useSignOut } from "../hooks/use-sign-out";

export type AccountIndicatorProps = { layout?: "bar" | "menu"; onNavigate?: () => void };

/** "Signed in as <name> (<role>)" with sign-out, or the way in for someone signed out. Sits on the dark top bar. */
export function AccountIndicator({ layout = "bar", onNavigate }: AccountIndicatorProps) {
  const me = useMe();
  const signOut = useSignOut();

  if (me.isPending) return <span className="text-sm text-sand-200/70">Checking account…</span>;

  if (!me.data) {
    return (
      <div className={clsx("flex gap-2", layout === "menu" && "flex-col")}>
        <Link
          to={paths.signIn.href()}
          onClick={onNavigate}
          className={buttonClasses("on-dark", "sm", layout === "menu" ? "w-full" : undefined)}
        >
          Sign in
        </Link>
        <Link
          to={paths.signUp.href()}
          onClick={onNavigate}
          className={buttonClasses("accent", "sm", layout === "menu" ? "w-full" : undefined)}
        >
          Create account
        </Link>
      </div>
    );
  }

  const { user } = me.data;
  return (
    <div className={clsx("flex gap-3", layout === "menu" ? "flex-col" : "items-center")}>
      <p className={clsx("flex min-w-0 items-baseline gap-1 text-sm whitespace-nowrap text-sand-200", layout === "bar" && "max-w-80")}>
        <span>Signed in as</span>{" "}
        <Link
          to={paths.account.href()}
          onClick={onNavigate}
          className="min-w-0 truncate font-semibold text-sand-50 underline-offset-4 hover:underline"
        >
          {user.name}
        </Link>{" "}
        <span className="text-sand-300">({user.role})</span>
      </p>
      <Button
        variant="on-dark"
        size="sm"
        loading={signOut.isPending}
        loadingText="Signing out…"
        onClick={() => signOut.mutate()}
        fullWidth={layout === "menu"}
      >
        Sign out
      </Button>
    </div>
  );
}
