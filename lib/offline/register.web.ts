// Web, production builds only: registers the service worker (server/web/service-worker.js,
// written into the export as /sw.js) so the app loads with no network once opened online.
// Imported for this effect by app/_layout.tsx. A dev server has no sw.js, and a worker there
// would serve stale bundles.
function register(): void {
  navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch((err: unknown) => {
    // The app still works online without it; only loading offline is lost.
    console.warn('Offline loading unavailable: the service worker did not register', err);
  });
}

if (!__DEV__ && typeof navigator !== 'undefined' && 'serviceWorker' in navigator) {
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}

export {};
