// The local e-mail fake's inbox lives in the database (lib/dev-inbox.ts): what the fake accepted is stored before
// the SMTP "250 OK", any server on the database reads it (tests/api/multi-server.test.ts shows two servers), and
// only the newest DEV_INBOX_KEPT are kept.
import { afterAll, beforeAll, expect, test } from "vitest";
import { DEV_INBOX_KEPT, keepInInbox, readInbox } from "../../server/lib/dev-inbox";
import { devMail } from "../../server/db/schema";
import { adminClient, uniqueEmail, TEST_PASSWORD } from "../factories/users";
import { HttpClient } from "../setup/http";
import { startTestServer, type TestServer } from "../setup/server";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.stop());

test("a verification e-mail the fake accepted is already in the database inbox the admin reads", async () => {
  const email = uniqueEmail("inbox");
  expect(
    (
      await new HttpClient(server.url).post("/api/auth/sign-up/email", {
        name: "Inbox Golfer",
        email,
        password: TEST_PASSWORD,
        accountType: "player",
      })
    ).status,
  ).toBe(200);
  const received = await server.smtpFake!.waitFor((m) => m.to.includes(email));
  // waitFor resolves only after `keep` stored it: the row is there without waiting.
  const rows = (await server.database.db.select().from(devMail)).filter((r) => r.toAddresses.includes(email));
  expect(rows).toHaveLength(1);
  expect(rows[0]!.subject).toBe(received.subject);
  const admin = await adminClient(server);
  const read = await admin.client.get("/api/dev/mail");
  expect(read.status).toBe(200);
  const mine = (read.body.messages as { to: string[]; subject: string; text: string }[]).filter((m) => m.to.includes(email));
  expect(mine).toHaveLength(1);
  expect(mine[0]!.text).toBe(received.text);
});

test(`the inbox keeps the newest ${DEV_INBOX_KEPT} messages, newest first`, async () => {
  const keep = keepInInbox(server.database.db);
  const base = Date.parse("2030-01-01T00:00:00Z");
  const extra = 5;
  for (let i = 0; i < DEV_INBOX_KEPT + extra; i++) {
    await keep({
      id: String(i),
      from: "a@example.test",
      to: [`n${i}@example.test`],
      subject: `number ${i}`,
      text: "",
      html: "",
      receivedAt: new Date(base + i * 1000).toISOString(),
    });
  }
  const inbox = await readInbox(server.database.db);
  expect(inbox).toHaveLength(DEV_INBOX_KEPT);
  expect(inbox[0]!.subject).toBe(`number ${DEV_INBOX_KEPT + extra - 1}`);
  expect(inbox.some((m) => m.subject === `number ${extra - 1}`)).toBe(false);
  expect(inbox.some((m) => m.subject === `number ${extra}`)).toBe(true);
  expect((await server.database.db.select().from(devMail)).length).toBe(DEV_INBOX_KEPT);
}, 60_000);
