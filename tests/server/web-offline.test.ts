// The offline web app's build step and serving: the precache manifest written after the export
// (server/web/precache.ts) and the headers the server gives the service worker files.
import { readFileSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Script } from 'node:vm';
import request from 'supertest';
import type { RunningServer } from '@/server/server';
import { MANIFEST_PLACEHOLDER, isPrecached, precacheManifest, serviceWorkerSource } from '@/server/web/precache';
import { testServer } from './helpers';

const file = (path: string, text: string) => ({ path, bytes: Buffer.from(text) });
const build = [
  file('index.html', '<div id="root"></div>'),
  file('_expo/static/js/web/entry-1.js', 'abc'),
  file('assets/node_modules/expo-sqlite/web/wa-sqlite/wa-sqlite.1.wasm', 'wasm bytes'),
  file('sw.js', 'old worker'),
  file('sw-manifest.json', '{}'),
  file('metadata.json', '{}'),
  file('_expo/static/js/web/entry-1.js.map', '{}'),
];

describe('precache manifest', () => {
  const manifest = precacheManifest(build);

  it('lists the app files by URL, sorted, without the worker, its manifest, metadata or source maps', () => {
    expect(manifest.files.map((f) => f.url)).toEqual([
      '/_expo/static/js/web/entry-1.js',
      '/assets/node_modules/expo-sqlite/web/wa-sqlite/wa-sqlite.1.wasm',
      '/index.html',
    ]);
    expect(['sw.js', 'sw-manifest.json', 'metadata.json', 'a.js.map', '.hidden/x'].some(isPrecached)).toBe(false);
  });

  it('hashes each file with SHA-256 and adds up the sizes', () => {
    // SHA-256("abc"): the test vector of FIPS 180-2, appendix B.1.
    expect(manifest.files[0].sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(manifest.size).toBe(3 + 'wasm bytes'.length + '<div id="root"></div>'.length);
  });

  it('has a version that ignores file order but changes with any byte of any file', () => {
    expect(precacheManifest([...build].reverse()).version).toBe(manifest.version);
    const changed = build.map((f) => (f.path === 'index.html' ? file(f.path, '<div id="root"> </div>') : f));
    expect(precacheManifest(changed).version).not.toBe(manifest.version);
    // A file the worker does not precache does not make a new version.
    const otherMap = build.map((f) => (f.path.endsWith('.map') ? file(f.path, '{"v":2}') : f));
    expect(precacheManifest(otherMap).version).toBe(manifest.version);
  });

  it('writes the manifest into the real service worker template, which then compiles', () => {
    const template = readFileSync(join(__dirname, '../../server/web/service-worker.js'), 'utf8');
    const source = serviceWorkerSource(template, manifest);
    expect(source).not.toContain(MANIFEST_PLACEHOLDER);
    expect(source).toContain(`"version":"${manifest.version}"`);
    expect(() => new Script(source)).not.toThrow();
  });

  it('refuses a template without the placeholder, or with it twice', () => {
    expect(() => serviceWorkerSource('const M = 1;', manifest)).toThrow(MANIFEST_PLACEHOLDER);
    expect(() => serviceWorkerSource(`${MANIFEST_PLACEHOLDER} ${MANIFEST_PLACEHOLDER}`, manifest)).toThrow();
  });
});

describe('serving the service worker', () => {
  let dir: string;
  let server: RunningServer;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'overstrand-sw-'));
    mkdirSync(join(dir, '_expo'), { recursive: true });
    writeFileSync(join(dir, 'index.html'), '<div id="root"></div>');
    writeFileSync(join(dir, '_expo', 'entry-1.js'), 'console.log("app")');
    writeFileSync(join(dir, 'sw.js'), 'self.addEventListener("fetch", () => {});');
    writeFileSync(join(dir, 'sw-manifest.json'), '{}');
    server = await testServer({ config: { webDir: dir } });
  });
  afterAll(async () => {
    await server.stop();
    rmSync(dir, { recursive: true, force: true });
  });

  it('serves sw.js as JavaScript that the browser revalidates on every update check, scoped to the origin', async () => {
    const res = await request(server.url).get('/sw.js');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['service-worker-allowed']).toBe('/');
    expect(res.headers['cross-origin-embedder-policy']).toBe('require-corp');
  });

  it('serves the manifest uncached and leaves the bundles to the default caching', async () => {
    expect((await request(server.url).get('/sw-manifest.json')).headers['cache-control']).toBe('no-cache');
    const bundle = await request(server.url).get('/_expo/entry-1.js');
    expect(bundle.headers['cache-control']).not.toBe('no-cache');
    expect(bundle.headers['service-worker-allowed']).toBeUndefined();
  });
});
