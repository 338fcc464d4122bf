// Child process of run.mjs: the real server (startServer) serving dist/ with a fresh SQLite file
// and its own SMTP fake. Prints one JSON line {url} when ready; stops cleanly on SIGTERM.
import { startServer } from '@/server/server';

async function main() {
  const dbPath = process.env.BROWSER_DB_PATH;
  if (!dbPath) throw new Error('BROWSER_DB_PATH is required');
  const server = await startServer({
    dbPath,
    // Every spec signs in several times from one address; the production limit would trip.
    // Specs read each e-mail as soon as it is sent: no digests (pacing has its own tests in
    // tests/server/comment-quotas.test.ts).
    config: { webDir: 'dist', authRateLimit: { windowMs: 60_000, limit: 1000 }, bcryptRounds: 4, mailPacing: { quietMs: 0, maxWaitMs: 0, cap: 50 } },
  });
  process.stdout.write(JSON.stringify({ url: server.url }) + '\n');
  const stop = () => void server.stop().then(() => process.exit(0));
  process.once('SIGTERM', stop);
  process.once('SIGINT', stop);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
