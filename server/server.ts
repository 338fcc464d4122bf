// Starts and stops the whole server: database (migrated), mail, HTTP. Tests call
// startServer({ port: 0 }) and get a fresh in-memory database and their own SMTP fake.
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import pino, { type Level } from 'pino';
import { createApp } from './app';
import { areas } from './areas';
import { defaultConfig, type Config } from './config';
import { keptJwtSecret } from './auth/secret';
import { openDatabase } from './db/connect';
import { seedDemo } from './demo/seed';
import { createJobPool } from './jobs/pool';
import type { Deps } from './deps';
import { createSmtpMailer, type Mailer, type SmtpTarget } from './mail/mailer';
import { startSmtpFake, type Mailbox } from './mail/smtp-fake';

export interface StartOptions {
  /** 0 (the default) picks a free port. */
  port?: number;
  /** Default 127.0.0.1; pass '0.0.0.0' or '::' to listen on every interface. */
  host?: string;
  /** SQLite file, created with its folder if missing; default ':memory:'. */
  dbPath?: string;
  /** publicUrl defaults to http://localhost:<port>. */
  config?: Partial<Config>;
  /** Send mail here instead of the built-in SMTP fake (then `mailbox` is null). */
  mailer?: Mailer;
  /** A real SMTP relay instead of the built-in fake. */
  smtp?: SmtpTarget;
  /** Default 'silent'. */
  logLevel?: Level | 'silent';
  now?: () => Date;
  /** Load the demo scenario (idempotent). */
  demo?: boolean;
}

export interface RunningServer {
  url: string;
  port: number;
  app: Express;
  deps: Deps;
  /** The SMTP fake's kept mail, or null when mail goes elsewhere. */
  mailbox: Mailbox | null;
  /** Rows the demo seed added (0 when it already existed or demo is off). */
  demoRowsAdded: number;
  stop(): Promise<void>;
}

export async function startServer(options: StartOptions = {}): Promise<RunningServer> {
  const log = pino({ level: options.logLevel ?? 'silent' });
  // publicUrl is filled in once the port is known, before the first request can arrive.
  const config = defaultConfig({ publicUrl: '', ...options.config });
  const dbPath = options.dbPath ?? ':memory:';
  const db = await openDatabase(dbPath);
  const mailbox = options.mailer || options.smtp ? null : await startSmtpFake();
  const target = options.smtp ?? (mailbox && { host: mailbox.host, port: mailbox.port, plain: true });
  const mailer = options.mailer ?? createSmtpMailer(target!, config.mailFrom);
  const jobs = createJobPool(config.jobs);
  const deps: Deps = { db, config, mailer, mailbox, log, jobs, now: options.now ?? (() => new Date()) };
  const services: { stop(): Promise<void> }[] = [];
  const closeAll = async () => {
    for (const s of services.splice(0)) await s.stop();
    await jobs.destroy();
    await mailbox?.stop();
    await db.destroy();
  };

  let demoRowsAdded = 0;
  const app = createApp(deps);
  const http = createServer(app);
  try {
    config.jwtSecret ||= await keptJwtSecret(dbPath);
    if (options.demo) demoRowsAdded = await seedDemo(deps);
    for (const area of areas) if (area.start) services.push(await area.start(deps));
    await new Promise<void>((resolve, reject) => {
      http.once('error', reject);
      http.listen(options.port ?? 0, options.host ?? '127.0.0.1', resolve);
    });
  } catch (err) {
    await closeAll();
    throw err;
  }
  const port = (http.address() as AddressInfo).port;
  const url = `http://localhost:${port}`;
  config.publicUrl ||= url;
  return {
    url,
    port,
    app,
    deps,
    mailbox,
    demoRowsAdded,
    async stop() {
      await new Promise<void>((resolve) => {
        http.close(() => resolve());
        http.closeAllConnections();
      });
      await closeAll();
    },
  };
}
