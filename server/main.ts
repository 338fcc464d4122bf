// `npm run serve`: the environment (checked by config.ts) -> startServer(). Development adds the
// demo scenario and the local SMTP fake with its /dev/mail page, and prints the demo sign-ins;
// production has neither and never prints a password.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { settingsFromEnv } from './config';
import { DEMO_GROUP, DEMO_USERS } from './demo/seed';
import { startServer } from './server';

async function main() {
  const settings = settingsFromEnv(process.env);
  const { production, demo, config } = settings; // demo is refused with production (config.ts)
  const server = await startServer({ ...settings, logLevel: production ? 'info' : 'warn' });
  const webDir = config.webDir ?? 'dist';
  const lines = [
    `Overstrand is running at ${server.url} (listening on ${settings.host}:${server.port})`,
    existsSync(join(webDir, 'index.html')) ? `  web app from ${webDir}/` : `  no web build in ${webDir}/ (run npm run build:web): API only`,
    server.mailbox ? `  kept mail (development, this machine only): ${server.url}/dev/mail` : '',
    demo ? (server.demoRowsAdded ? `  demo scenario loaded (${server.demoRowsAdded} rows)` : '  demo scenario already present') : '',
    ...(demo
      ? [`Demo sign-ins, group "${DEMO_GROUP.name}":`, ...DEMO_USERS.map((u) => `  ${u.role.padEnd(6)}  ${u.email}  password: ${u.password}`)]
      : []),
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
