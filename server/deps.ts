// What every area's routes and use-cases receive. Tests build it through startServer().
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config';
import type { JobPool } from './jobs/pool';
import type { Mailer } from './mail/mailer';
import type { Mailbox } from './mail/smtp-fake';

export interface Deps {
  db: DataSource;
  config: Config;
  mailer: Mailer;
  /** The local SMTP fake when one runs (development, tests), else null. */
  mailbox: Mailbox | null;
  log: Logger;
  /** Worker threads for short computations a request or a write needs (server/jobs). */
  jobs: JobPool;
  /** The clock; tests move it to expire invitations. */
  now: () => Date;
}
