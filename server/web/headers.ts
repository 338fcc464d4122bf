// Headers for the service worker files of the web build. The browser must revalidate sw.js on
// every update check (a new build = new bytes), and its scope is the whole origin.
import { basename } from 'node:path';
import type { Response } from 'express';

export function setServiceWorkerHeaders(res: Response, path: string): void {
  const name = basename(path);
  if (name !== 'sw.js' && name !== 'sw-manifest.json') return;
  res.setHeader('Cache-Control', 'no-cache');
  if (name === 'sw.js') res.setHeader('Service-Worker-Allowed', '/');
}
