// Required first by the files piscina loads in pool threads (server/runs/worker.cjs,
// server/jobs/worker.cjs).
// - A worker thread starts without the loaders of the main process (Jest's transform, or
//   `node --import tsx`), so this registers tsx's CommonJS hook with the server tsconfig
//   (decorator settings, the @/ alias); the shims then require their TypeScript (CommonJS, like
//   the rest of the server: the repository is not "type": "module").
// - The shims are CommonJS, not ES modules: piscina require()s its file, and Node 20 aborts the
//   whole process when a thread is terminated (a cancelled run) while require() is still
//   instantiating an ES module graph.
// - The thread computes at the lowest priority (nice 19), so on a busy machine the request
//   thread gets the CPU first. On Linux a thread is a task with its own id, which setpriority
//   takes; elsewhere the thread keeps the process's priority.
const { readlinkSync } = require('node:fs');
const { setPriority } = require('node:os');
const { join } = require('node:path');
const { register } = require('tsx/cjs/api');

process.env.TSX_TSCONFIG_PATH ??= join(__dirname, 'tsconfig.json');
register();

try {
  setPriority(Number(readlinkSync('/proc/thread-self').split('/').pop()), 19);
} catch {
  // not Linux: no per-thread priority
}
