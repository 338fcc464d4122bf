// `npm run test:browser`: Debian chromium, a fresh web export when the sources changed, the real
// server on a free port with a temporary database, then the specs (tests/browser/*.spec.ts) under
// Jest. Exits non-zero when anything fails. `--rebuild` forces the export.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const CHROMIUM = '/usr/bin/chromium';
const SOURCES = ['app', 'components', 'hooks', 'lib', 'constants', 'shared', 'sync', 'assets', 'server/web',
  'app.json', 'metro.config.js', 'babel.config.js', 'package.json'];

function seconds(since) {
  return ((performance.now() - since) / 1000).toFixed(1) + ' s';
}

function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  const command = 'apt-get update && apt-get install -y chromium';
  if (process.getuid?.() !== 0) {
    console.error(`Chromium is missing. Install it with:\n  sudo ${command}`);
    process.exit(1);
  }
  console.log(`Chromium is missing; running: ${command}`);
  const r = spawnSync('sh', ['-c', command], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  if (r.status !== 0 || !existsSync(CHROMIUM)) process.exit(1);
}

/** Newest modification time under `path` (a file or a folder), ignoring nothing but missing paths. */
function newest(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return readdirSync(path).reduce((m, name) => Math.max(m, newest(join(path, name))), st.mtimeMs);
}

function ensureExport() {
  const index = join(root, 'dist/index.html');
  const stale = !existsSync(index) || SOURCES.some((s) => newest(join(root, s)) > statSync(index).mtimeMs);
  if (!stale && !process.argv.includes('--rebuild')) {
    console.log('web export: dist/ is up to date');
    return;
  }
  const t = performance.now();
  console.log('web export: building dist/ (npm run build:web)...');
  const r = spawnSync('npm', ['run', '-s', 'build:web'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
  if (r.status !== 0) {
    console.error('web export failed');
    process.exit(1);
  }
  console.log(`web export: done in ${seconds(t)}`);
}

/** Starts tests/browser/serve.ts; resolves with its URL and a stop function. */
function startServer(dbDir) {
  const child = spawn(process.execPath, ['--import', 'tsx', 'tests/browser/serve.ts'], {
    cwd: root,
    env: { ...process.env, TSX_TSCONFIG_PATH: 'server/tsconfig.json', BROWSER_DB_PATH: join(dbDir, 'browser.sqlite') },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const stop = () =>
    new Promise((done) => {
      if (child.exitCode !== null) return done();
      child.once('exit', done);
      child.kill('SIGTERM');
    });
  return new Promise((ready, fail) => {
    child.once('exit', (code) => fail(new Error(`server exited early (code ${code})`)));
    createInterface({ input: child.stdout }).once('line', (line) => ready({ url: JSON.parse(line).url, stop }));
  });
}

async function main() {
  ensureChromium();
  ensureExport();
  const dbDir = mkdtempSync(join(tmpdir(), 'overstrand-browser-'));
  const server = await startServer(dbDir);
  console.log(`server: ${server.url} (database in ${dbDir})`);
  const t = performance.now();
  const jest = spawnSync(
    process.execPath,
    ['node_modules/jest/bin/jest.js', '-c', 'tests/browser/jest.config.js', '--runInBand', ...process.argv.slice(2).filter((a) => a !== '--rebuild')],
    { cwd: root, stdio: 'inherit', env: { ...process.env, BROWSER_BASE_URL: server.url, CHROMIUM_PATH: CHROMIUM } },
  );
  console.log(`browser specs: ${seconds(t)}; screenshots in tests/artifacts/`);
  await server.stop();
  rmSync(dbDir, { recursive: true, force: true });
  process.exit(jest.status ?? 1);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
