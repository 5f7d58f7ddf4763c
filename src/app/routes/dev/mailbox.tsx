import { PageHeader } from "../../../components/ui";
import { Mailbox } from "../../../features/dev-mail/components/mailbox";

export function MailboxRoute() {
  return (
    <>
      <title>Dev mailbox · Borrowline</title>
      <PageHeader
        eyebrow="Development"
        title="Mailbox"
        description="Every e-mail the server has sent while running in development: sign-up confirmations, password resets, squad invitations."
      />
      <Mailbox />
    </>
  );
}

export { MailboxRoute as Component };
