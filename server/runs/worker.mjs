// The file piscina loads in each run thread: tsx first (server/pool-thread.mjs), then the
// TypeScript worker.
import '../pool-thread.mjs';
import { createRequire } from 'node:module';

export default createRequire(import.meta.url)('./worker.ts').default;
