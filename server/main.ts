// `npm run serve`: the server with the exported web app, the demo scenario and (outside
// production) the local SMTP fake with its /dev/mail page.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { configFromEnv } from './config';
import { DEMO_GROUP, DEMO_USERS } from './demo/seed';
import { startServer } from './server';

async function main() {
  const env = process.env;
  const config = configFromEnv(env);
  const production = env.NODE_ENV === 'production';
  if (production && !env.SMTP_HOST) throw new Error('SMTP_HOST (and SMTP_PORT) must be set when NODE_ENV=production');
  const server = await startServer({
    port: Number(env.PORT ?? 8080),
    host: env.HOST ?? '0.0.0.0',
    dbPath: env.DATABASE_PATH ?? 'data/overstrand.sqlite',
    config,
    smtp: env.SMTP_HOST ? { host: env.SMTP_HOST, port: Number(env.SMTP_PORT ?? 587) } : undefined,
    logLevel: production ? 'info' : 'warn',
    demo: true,
  });
  const webDir = config.webDir ?? 'dist';
  const lines = [
    `Overstrand is running at ${server.url}`,
    existsSync(join(webDir, 'index.html')) ? `  web app from ${webDir}/` : `  no web build in ${webDir}/ (run npm run build:web): API only`,
    server.mailbox ? `  kept mail (development): ${server.url}/dev/mail` : '',
    server.demoRowsAdded ? `  demo scenario loaded (${server.demoRowsAdded} rows)` : '  demo scenario already present',
    `Demo sign-ins, group "${DEMO_GROUP.name}":`,
    ...DEMO_USERS.map((u) => `  ${u.role.padEnd(6)}  ${u.email}  password: ${u.password}`),
  ];
  console.log(lines.filter(Boolean).join('\n'));

  const shutdown = () => {
    server.stop().then(() => process.exit(0));
  };
  process.once('SIGINT', shutdown);
  process.once('SIGTERM', shutdown);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
