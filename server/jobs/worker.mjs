// The file piscina loads in each job thread: tsx first (server/pool-thread.mjs), then the
// TypeScript tasks, one named export per job (piscina's `name` picks it).
import '../pool-thread.mjs';
import { createRequire } from 'node:module';

export const { summary, cables, runKey, bandsProblem } = createRequire(import.meta.url)('./tasks.ts');
