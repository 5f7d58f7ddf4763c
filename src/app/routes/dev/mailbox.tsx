import { PageHeader } from "../../../components/ui";
import { Mailbox } from "../../../features/dev-mail/components/mailbox";

export function MailboxRoute() {
  return (
    <>
      <title>Local inbox · Borrowline</title>
      <PageHeader
        eyebrow="Administration"
        title="Local inbox"
        description="No mail server is set up (SMTP_URL), so the e-mail this server sends is held here and not delivered: sign-up confirmations, password resets, squad invitations. Only administrators can read it."
      />
      <Mailbox />
    </>
  );
}

export { MailboxRoute as Component };
