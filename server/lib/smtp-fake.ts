// A real SMTP listener on 127.0.0.1 that keeps what it receives: the e-mail "service" in
// development and tests. Production points SMTP_URL at a real server instead.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

export type ReceivedMail = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
};

export type SmtpFake = {
  url: string;
  port: number;
  messages: ReceivedMail[];
  /** Resolves with the first message (already received or arriving) that matches. */
  waitFor: (match: (m: ReceivedMail) => boolean, timeoutMs?: number) => Promise<ReceivedMail>;
  close: () => Promise<void>;
};

const MAX_KEPT = 200;

export type SmtpFakeOptions = {
  port?: number;
  /**
   * Keeps a received message somewhere lasting (the database's inbox, db/schema.ts `devMail`). The SMTP "250 OK"
   * waits for it, so a message the sender saw accepted is in the inbox; a failure is an SMTP error to the sender.
   */
  keep?: (mail: ReceivedMail) => Promise<void>;
  /**
   * A connection that failed mid-message (the sender's socket reset, say). smtp-server reports it as an "error" on the
   * server, which with no listener would end the process; the fake carries on serving the other connections.
   */
  onConnectionError?: (err: Error) => void;
};

export async function startSmtpFake({ port = 0, keep, onConnectionError = () => {} }: SmtpFakeOptions = {}): Promise<SmtpFake> {
  const messages: ReceivedMail[] = [];
  const waiters = new Set<{ match: (m: ReceivedMail) => boolean; resolve: (m: ReceivedMail) => void }>();
  let counter = 0;

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["AUTH", "STARTTLS"],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const toField = Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : [];
          const mail: ReceivedMail = {
            id: String(++counter),
            from: parsed.from?.text ?? "",
            to: toField.flatMap((a) => a.value.map((v) => v.address ?? "")),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : "",
            receivedAt: new Date().toISOString(),
          };
          if (keep) await keep(mail);
          messages.push(mail);
          if (messages.length > MAX_KEPT) messages.shift();
          for (const w of waiters) {
            if (w.match(mail)) {
              waiters.delete(w);
              w.resolve(mail);
            }
          }
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", reject);
      resolve();
    });
  });
  server.on("error", onConnectionError);
  const address = server.server.address();
  const actualPort = typeof address === "object" && address ? address.port : port;

  return {
    url: `smtp://127.0.0.1:${actualPort}`,
    port: actualPort,
    messages,
    waitFor(match, timeoutMs = 10_000) {
      const found = messages.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const entry = { match, resolve: (m: ReceivedMail) => (clearTimeout(timer), resolve(m)) };
        const timer = setTimeout(() => {
          waiters.delete(entry);
          reject(new Error("No matching e-mail arrived in time"));
        }, timeoutMs);
        waiters.add(entry);
      });
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
