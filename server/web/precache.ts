// The precache list of the exported web build: every file the app needs to start with no
// network, each with its SHA-256, and a build version derived from them all, so a new export
// gives a new sw.js (which the browser installs) and a new cache name, and an unchanged export
// gives the same bytes (no needless reinstall).
import { createHash } from 'node:crypto';

/** A file of the export; `path` is relative to the export folder, with '/' separators. */
export interface BuiltFile {
  path: string;
  bytes: Uint8Array;
}

export interface PrecacheEntry {
  url: string;
  sha256: string;
  size: number;
}

export interface PrecacheManifest {
  version: string;
  size: number;
  files: PrecacheEntry[];
}

/** The placeholder in service-worker.js that the manifest replaces. */
export const MANIFEST_PLACEHOLDER = '__PRECACHE_MANIFEST__';

// The worker itself and its manifest are fetched by the browser's update check, never from
// the cache; Expo's metadata.json and source maps are not used by the running app.
const NOT_PRECACHED = new Set(['sw.js', 'sw-manifest.json', 'metadata.json']);

export function isPrecached(path: string): boolean {
  return !NOT_PRECACHED.has(path) && !path.endsWith('.map') && !path.split('/').some((part) => part.startsWith('.'));
}

const sha256 = (bytes: Uint8Array | string) => createHash('sha256').update(bytes).digest('hex');

/** Sorted by URL so the same export always yields the same manifest. Empty input: version of no files. */
export function precacheManifest(files: BuiltFile[]): PrecacheManifest {
  const entries = files
    .filter((f) => isPrecached(f.path))
    .map((f) => ({ url: '/' + f.path, sha256: sha256(f.bytes), size: f.bytes.byteLength }))
    .sort((a, b) => (a.url < b.url ? -1 : a.url > b.url ? 1 : 0));
  return {
    version: sha256(entries.map((e) => `${e.url} ${e.sha256}\n`).join('')).slice(0, 16),
    size: entries.reduce((n, e) => n + e.size, 0),
    files: entries,
  };
}

/** The service worker's source with the manifest written in; the template must hold the placeholder once. */
export function serviceWorkerSource(template: string, manifest: PrecacheManifest): string {
  const parts = template.split(MANIFEST_PLACEHOLDER);
  if (parts.length !== 2) throw new Error(`service worker template must contain ${MANIFEST_PLACEHOLDER} exactly once`);
  return parts[0] + JSON.stringify(manifest) + parts[1];
}
