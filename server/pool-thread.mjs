// Imported first by the files piscina loads in pool threads (server/runs/worker.mjs,
// server/jobs/worker.mjs).
// - A worker thread starts without the loaders of the main process (Jest's transform, or
//   `node --import tsx`), so this registers tsx's CommonJS hook with the server tsconfig
//   (decorator settings, the @/ alias); the shims then require their TypeScript (CommonJS, like
//   the rest of the server: the repository is not "type": "module").
// - The thread computes at the lowest priority (nice 19), so on a busy machine the request
//   thread gets the CPU first. On Linux a thread is a task with its own id, which setpriority
//   takes; elsewhere the thread keeps the process's priority.
import { readlinkSync } from 'node:fs';
import { setPriority } from 'node:os';
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/cjs/api';

process.env.TSX_TSCONFIG_PATH ??= fileURLToPath(new URL('./tsconfig.json', import.meta.url));
register();

try {
  setPriority(Number(readlinkSync('/proc/thread-self').split('/').pop()), 19);
} catch {
  // not Linux: no per-thread priority
}
