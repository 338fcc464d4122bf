// Outgoing mail for every area (invitations today; finished runs and notifications later):
// compose a message, call mailer.send(). Delivery goes over SMTP with nodemailer.
import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** An HTML alternative to the text, when the message carries formatted words (a comment). */
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export interface SmtpTarget {
  host: string;
  port: number;
  /** For a real relay; the local fake needs none. */
  auth?: { user: string; pass: string };
  /** Only the local fake (plain SMTP on loopback): skip STARTTLS even when offered. */
  plain?: boolean;
}

export function createSmtpMailer(target: SmtpTarget, from: string): Mailer {
  const transport = nodemailer.createTransport({
    host: target.host,
    port: target.port,
    secure: target.port === 465,
    // A relay, with or without credentials, gets STARTTLS whenever it offers it.
    ignoreTLS: target.plain === true,
    auth: target.auth,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
  };
}
