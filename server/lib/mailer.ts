import nodemailer from "nodemailer";
import type { Logger } from "pino";

export type OutgoingMail = { to: string; subject: string; text: string; html?: string };
export type Mailer = { send: (mail: OutgoingMail) => Promise<void> };

/** Sends through SMTP with nodemailer: the local fake in development and tests, SMTP_URL in production. */
export function createMailer(smtpUrl: string, from: string, logger: Logger): Mailer {
  const url = new URL(smtpUrl);
  const local = url.protocol === "smtp:" && ["127.0.0.1", "localhost"].includes(url.hostname);
  // The local fake speaks plain SMTP on loopback; anything else uses the URL as given (TLS, auth).
  const transport = local
    ? nodemailer.createTransport({ host: url.hostname, port: Number(url.port), secure: false, ignoreTLS: true })
    : nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
      logger.info({ to: mail.to, subject: mail.subject }, "mail sent");
    },
  };
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

/** A plain transactional e-mail: one paragraph and one link, as text and as HTML. */
export function linkMail(to: string, subject: string, intro: string, linkLabel: string, url: string): OutgoingMail {
  return {
    to,
    subject,
    text: `${intro}\n\n${linkLabel}: ${url}\n\nIf you did not expect this e-mail, you can ignore it.\n— Borrowline`,
    html: `<p>${escapeHtml(intro)}</p><p><a href="${escapeHtml(url)}">${escapeHtml(linkLabel)}</a></p><p>If you did not expect this e-mail, you can ignore it.<br>— Borrowline</p>`,
  };
}
