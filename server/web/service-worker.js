// Overstrand's service worker: lets the web app LOAD with no network once it has been opened
// online (docs/product.md journey 1). The data itself lives in the app's own store (expo-sqlite in
// origin-private storage) and syncs through /api, which this worker never touches.
// server/web/write-service-worker.ts writes the build's precache manifest in below.
const MANIFEST = __PRECACHE_MANIFEST__;
const PREFIX = 'overstrand-shell-';
const CACHE = PREFIX + MANIFEST.version;
const SHELL = '/index.html';
const PRECACHED = new Set(MANIFEST.files.map((f) => f.url));
// On a network that hangs rather than fails, the cached app opens after this long.
const NAVIGATION_TIMEOUT_MS = 4000;

// expo-sqlite on web needs a cross-origin isolated page, and the cached copy of the page and of
// its workers is what makes it so offline: keep the isolation headers on every stored response.
function isolated(response) {
  const headers = new Headers(response.headers);
  headers.set('Cross-Origin-Opener-Policy', 'same-origin');
  headers.set('Cross-Origin-Embedder-Policy', 'require-corp');
  headers.set('Cross-Origin-Resource-Policy', 'same-origin');
  return new Response(response.body, { status: response.status, statusText: response.statusText, headers });
}

function hex(buffer) {
  return Array.from(new Uint8Array(buffer), (b) => b.toString(16).padStart(2, '0')).join('');
}

// A file whose bytes differ from the manifest means the server changed build mid-install:
// fail the install and keep the previous worker and cache rather than mix two builds.
// 'no-cache' revalidates with the server, so a file the page has just loaded costs a 304, not a
// second download.
async function precache(cache, file) {
  const response = await fetch(file.url, { cache: 'no-cache' });
  if (!response.ok) throw new Error(`precache ${file.url}: ${response.status}`);
  const digest = hex(await crypto.subtle.digest('SHA-256', await response.clone().arrayBuffer()));
  if (digest !== file.sha256) throw new Error(`precache ${file.url}: content differs from the manifest`);
  await cache.put(file.url, isolated(response));
}

self.addEventListener('install', (event) => {
  event.waitUntil(
    (async () => {
      const cache = await caches.open(CACHE);
      await Promise.all(MANIFEST.files.map((file) => precache(cache, file)));
      await self.skipWaiting();
    })(),
  );
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    (async () => {
      const names = await caches.keys();
      await Promise.all(names.filter((n) => n.startsWith(PREFIX) && n !== CACHE).map((n) => caches.delete(n)));
      await self.clients.claim();
    })(),
  );
});

function timeout(ms) {
  return new Promise((_, reject) => setTimeout(() => reject(new Error('network timeout')), ms));
}

// Network first, so an online reload always gets the server's current page (and, through the
// browser's update check on sw.js, the new build); the cached page when the network fails.
async function navigation(request) {
  try {
    return await Promise.race([fetch(request), timeout(NAVIGATION_TIMEOUT_MS)]);
  } catch {
    const cached = await caches.match(SHELL, { cacheName: CACHE });
    if (cached) return cached;
    throw new Error('offline and the app is not cached');
  }
}

// The precached files are this build's content-hashed bundles and assets: the cache is right.
async function precachedFile(request, path) {
  return (await caches.match(path, { cacheName: CACHE })) ?? fetch(request);
}

self.addEventListener('fetch', (event) => {
  const request = event.request;
  if (request.method !== 'GET') return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || url.pathname.startsWith('/api/')) return;
  if (request.mode === 'navigate') event.respondWith(navigation(request));
  else if (PRECACHED.has(url.pathname)) event.respondWith(precachedFile(request, url.pathname));
});
