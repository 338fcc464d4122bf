// Run after `expo export` (npm run build:web): writes <dist>/sw-manifest.json and <dist>/sw.js
// (service-worker.js with the precache manifest written in) and prints the precache size.
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { precacheManifest, serviceWorkerSource, type BuiltFile } from './precache';

function filesUnder(root: string, dir = root): BuiltFile[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = join(dir, entry.name);
    if (entry.isDirectory()) return filesUnder(root, full);
    return entry.isFile() ? [{ path: relative(root, full).split(sep).join('/'), bytes: readFileSync(full) }] : [];
  });
}

const dist = process.argv[2] ?? 'dist';
const manifest = precacheManifest(filesUnder(dist));
const template = readFileSync(join(__dirname, 'service-worker.js'), 'utf8');
writeFileSync(join(dist, 'sw-manifest.json'), JSON.stringify(manifest, null, 2) + '\n');
writeFileSync(join(dist, 'sw.js'), serviceWorkerSource(template, manifest));
const mb = (manifest.size / 1024 / 1024).toFixed(2);
console.log(`service worker: ${manifest.files.length} files, ${mb} MB precached, build ${manifest.version}`);
