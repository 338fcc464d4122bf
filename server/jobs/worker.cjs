// The file piscina loads in each job thread: tsx first (server/pool-thread.cjs), then the
// TypeScript tasks, one named export per job (piscina's `name` picks it).
require('../pool-thread.cjs');

module.exports = require('./tasks.ts');
