import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { RunningServer } from '@/server/server';
import { testServer } from './helpers';

// A stand-in for the exported web build (dist/): an index.html and one hashed bundle.
let dir: string;
let server: RunningServer;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'overstrand-web-'));
  mkdirSync(join(dir, '_expo', 'static', 'js'), { recursive: true });
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Overstrand</title><div id="root"></div>');
  writeFileSync(join(dir, '_expo', 'static', 'js', 'entry-abc.js'), 'console.log("app")');
  writeFileSync(join(dir, '_expo', 'static', 'js', 'entry-big.js'), 'console.log("a large bundle");\n'.repeat(2000));
  server = await testServer({ config: { webDir: dir } });
});
afterAll(async () => {
  await server.stop();
  rmSync(dir, { recursive: true, force: true });
});

const isolated = (res: request.Response) => {
  expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
  expect(res.headers['cross-origin-embedder-policy']).toBe('require-corp');
};

describe('serving the exported web build', () => {
  it('serves index.html at / with the cross-origin isolation headers and no CSP', async () => {
    const res = await request(server.url).get('/');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root">');
    isolated(res);
    expect(res.headers['content-security-policy']).toBeUndefined();
  });

  it('serves the static bundle', async () => {
    const res = await request(server.url).get('/_expo/static/js/entry-abc.js');
    expect(res.status).toBe(200);
    expect(res.text).toContain('console.log');
    isolated(res);
  });

  it.each(['/invite/some-token', '/sketches/123', '/account'])('falls back to index.html for the client route %s', async (path) => {
    const res = await request(server.url).get(path);
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root">');
  });

  it.each(['/_expo/static/css/fonts/missing.woff2', '/assets/missing.ttf'])('answers a missing build file %s with 404, not the app page', async (path) => {
    const res = await request(server.url).get(path);
    expect(res.status).toBe(404);
    expect(res.text).not.toContain('<div id="root">');
  });

  it('sends large build files gzip-compressed to a browser that accepts it', async () => {
    const res = await request(server.url).get('/_expo/static/js/entry-big.js').set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.text).toContain('a large bundle');
    isolated(res);
  });

  it('keeps unknown /api routes as JSON 404, not the app page', async () => {
    const res = await request(server.url).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    isolated(res);
  });
});
