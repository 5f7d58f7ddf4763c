// The local mail fake (development and tests' e-mail service) keeps serving when one sender's connection fails
// mid-message. smtp-server reports such a failure as an "error" event on the server; unheard, Node ends the process.
import net from "node:net";
import { once } from "node:events";
import nodemailer from "nodemailer";
import { afterEach, expect, test } from "vitest";
import { startSmtpFake, type SmtpFake } from "./smtp-fake";

let fake: SmtpFake | undefined;
afterEach(async () => {
  await fake?.close();
  fake = undefined;
});

/** Speaks SMTP up to the recipient (a transaction is open), then resets the connection (TCP RST). */
async function resetMidMessage(port: number): Promise<void> {
  const socket = net.connect(port, "127.0.0.1");
  socket.setEncoding("utf8");
  let received = "";
  const reply = async (code: string) => {
    while (!received.split("\r\n").some((l) => l.startsWith(`${code} `))) {
      const [chunk] = (await once(socket, "data")) as [string];
      received += chunk;
    }
    received = "";
  };
  await reply("220");
  socket.write("EHLO tester\r\n");
  await reply("250");
  socket.write("MAIL FROM:<coach@example.test>\r\n");
  await reply("250");
  socket.write("RCPT TO:<player@example.test>\r\n");
  await reply("250");
  socket.resetAndDestroy();
}

test("a sender whose connection resets mid-message is reported, and the next message is still received", async () => {
  const errors: Error[] = [];
  fake = await startSmtpFake({ onConnectionError: (err) => errors.push(err) });
  await resetMidMessage(fake.port);
  await expect.poll(() => errors.map((e) => (e as NodeJS.ErrnoException).code)).toContain("ECONNRESET");

  const transport = nodemailer.createTransport({ host: "127.0.0.1", port: fake.port, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: "coach@example.test", to: "player@example.test", subject: "Still here", text: "Hello" });
  expect(fake.messages.map((m) => m.subject)).toEqual(["Still here"]);
});

test("with no listener given, resets mid-message do not end the process either", async () => {
  fake = await startSmtpFake();
  for (let i = 0; i < 3; i++) await resetMidMessage(fake.port);
  await new Promise((r) => setTimeout(r, 200));
  const transport = nodemailer.createTransport({ host: "127.0.0.1", port: fake.port, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: "coach@example.test", to: "player@example.test", subject: "Still here", text: "Hello" });
  expect(fake.messages).toHaveLength(1);
});
