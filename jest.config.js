// Two kinds of tests: pure TypeScript (shared, sync, server, CLI, lint rules) in Node, and React components
// under jest-expo. Browser tests have their own runner (tests/browser/run.mjs).
const alias = { '^@/(.*)$': '<rootDir>/$1' };

module.exports = {
  // 5 s per test (the default) is tight for rendering and server tests on a busy 2-core CI
  // machine; a test that hangs still fails, after 60 s.
  testTimeout: 60_000,
  // On a 2-core machine Jest runs the files in its own process (one worker), where a handle a
  // suite leaves open (a spawned worker process, a Redis connection) would keep `npm test`
  // waiting for ever after the last test: exit once the results are in.
  forceExit: true,
  reporters: ['default', ['<rootDir>/tests/summary-reporter.js', { label: 'unit' }]],
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests'],
      testMatch: ['<rootDir>/tests/{shared,sync,server,cli,lint}/**/*.test.ts'],
      transform: {
        '^.+\\.ts$': ['ts-jest', { tsconfig: 'server/tsconfig.json', isolatedModules: true }],
      },
      moduleNameMapper: alias,
    },
    {
      displayName: 'app',
      // RNTL needs React Native host components, so component tests render the native (iOS)
      // tree; web-only code paths are covered by the browser specs.
      preset: 'jest-expo/ios',
      roots: ['<rootDir>/tests'],
      testMatch: ['<rootDir>/tests/app/**/*.test.tsx'],
      setupFilesAfterEnv: ['<rootDir>/tests/app/setup.ts'],
      moduleNameMapper: alias,
    },
  ],
};
