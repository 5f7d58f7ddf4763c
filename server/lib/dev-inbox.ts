// The local e-mail fake's inbox in the database: every server on the database writes what its fake received
// and reads the same list, so the admin's mailbox is whole behind a load balancer.
import { desc, notInArray, sql } from "drizzle-orm";
import type { Db } from "../db/client";
import { devMail } from "../db/schema";
import type { ReceivedMail } from "./smtp-fake";

/** How many messages the inbox keeps (the newest). */
export const DEV_INBOX_KEPT = 200;

export type InboxMessage = { id: string; from: string; to: string[]; subject: string; text: string; html: string; receivedAt: string };

/** Stores one received message and drops the oldest beyond {@link DEV_INBOX_KEPT}. */
export function keepInInbox(db: Db): (mail: ReceivedMail) => Promise<void> {
  return async (mail) => {
    await db.insert(devMail).values({
      fromAddress: mail.from,
      toAddresses: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      receivedAt: new Date(mail.receivedAt),
    });
    const newest = db.select({ id: devMail.id }).from(devMail).orderBy(desc(devMail.receivedAt), desc(devMail.id)).limit(DEV_INBOX_KEPT);
    const [{ count } = { count: 0 }] = await db.select({ count: sql<number>`count(*)::int` }).from(devMail);
    if (count > DEV_INBOX_KEPT) await db.delete(devMail).where(notInArray(devMail.id, newest));
  };
}

/** The inbox, newest first. */
export async function readInbox(db: Db): Promise<InboxMessage[]> {
  const rows = await db.select().from(devMail).orderBy(desc(devMail.receivedAt), desc(devMail.id)).limit(DEV_INBOX_KEPT);
  return rows.map((r) => ({
    id: r.id,
    from: r.fromAddress,
    to: r.toAddresses,
    subject: r.subject,
    text: r.text,
    html: r.html,
    receivedAt: r.receivedAt.toISOString(),
  }));
}
