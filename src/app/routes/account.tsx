import { PageHeader } from "../../components/ui";
import { AccountDetails } from "../../features/auth/components/account-details";
import { RequireAuth } from "../../features/auth/components/require-auth";

export function AccountRoute() {
  return (
    <>
      <title>Account · Borrowline</title>
      <PageHeader eyebrow="Account" title="Your details" description="Who you are on Borrowline, and how lengths are shown to you." />
      <RequireAuth>{(me) => <AccountDetails me={me} />}</RequireAuth>
    </>
  );
}

export { AccountRoute as Component };
