// A local SMTP server that accepts every message and keeps it in memory, so development and
// tests can read the mail the server sends (GET /api/dev/mail, /dev/mail, or mailbox.list()).
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { KeptMail } from '@/shared/api/dev-mail';

export interface Mailbox {
  host: string;
  port: number;
  list(): KeptMail[];
  stop(): Promise<void>;
}

/** http(s) URLs in plain text, up to whitespace or a closing quote/bracket, minus end punctuation. */
export const URL_PATTERN = /https?:\/\/[^\s<>"')]*[^\s<>"').,;:!?]/g;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

export async function startSmtpFake(port = 0, host = '127.0.0.1'): Promise<Mailbox> {
  const kept: KeptMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const text = parsed.text ?? '';
          kept.push({
            id: randomUUID(),
            from: addresses(parsed.from)[0] ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '',
            text,
            date: new Date().toISOString(),
            links: text.match(URL_PATTERN) ?? [],
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  return {
    host,
    port: (server.server.address() as AddressInfo).port,
    list: () => [...kept],
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
