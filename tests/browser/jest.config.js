// Browser specs: plain Node + ts-jest; run through tests/browser/run.mjs, which provides the
// server (BROWSER_BASE_URL) and chromium (CHROMIUM_PATH).
const path = require('node:path');

module.exports = {
  rootDir: path.resolve(__dirname, '../..'),
  testEnvironment: 'node',
  testMatch: ['<rootDir>/tests/browser/**/*.spec.ts'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: 'tests/browser/tsconfig.json', isolatedModules: true }] },
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
  testTimeout: 60_000,
  reporters: ['default', ['<rootDir>/tests/summary-reporter.js', { label: 'browser' }]],
};
