// The file piscina loads in each run thread: tsx first (server/pool-thread.cjs), then the
// TypeScript worker.
require('../pool-thread.cjs');

module.exports = require('./worker.ts').default;
