// Lint rules for the whole repository, and the import boundaries between its parts:
// shared/ and sync/ are pure libraries (no UI, server, database or Node I/O), the server never
// imports app code, and the app never imports the server.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const nodeBuiltins = ['fs', 'path', 'os', 'net', 'http', 'https', 'child_process', 'worker_threads', 'cluster', 'dgram', 'dns', 'tls', 'readline', 'stream', 'zlib'];
const appFolders = ['app', 'components', 'hooks', 'lib', 'constants'];

const forbid = (message, ...groups) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: groups.flat(), message }] }],
});

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.expo/', 'coverage/', 'tests/artifacts/', 'data/', 'expo-env.d.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-require-imports': 'off',
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      'no-console': 'off',
    },
  },
  {
    files: ['server/web/service-worker.js'],
    languageOptions: { globals: { ...globals.serviceworker, __PRECACHE_MANIFEST__: 'readonly' } },
  },
  {
    files: appFolders.map((f) => `${f}/**/*.{ts,tsx}`),
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      ...forbid('The app never imports the server: share code through shared/ (the API contract is shared/api).',
        ['@/server', '@/server/*', '../server/*', '../../server/*', '../../../server/*']),
    },
  },
  {
    files: ['shared/**/*.ts', 'sync/**/*.ts'],
    rules: forbid('shared/ and sync/ are pure libraries: no React, React Native, Expo, Express, TypeORM, database or Node I/O, and no app or server code.',
      ['react', 'react/*', 'react-dom', 'react-native', 'react-native-*', 'expo', 'expo-*', '@expo/*', 'express', 'express-*', 'typeorm', 'better-sqlite3', 'ioredis', 'bullmq', 'piscina'],
      nodeBuiltins, nodeBuiltins.map((m) => `node:${m}`), nodeBuiltins.map((m) => `node:${m}/*`),
      appFolders.flatMap((f) => [`@/${f}`, `@/${f}/*`]), ['@/server', '@/server/*']),
  },
  {
    files: ['server/**/*.{ts,mjs,cjs,js}'],
    rules: forbid('The server never imports app code: share code through shared/.',
      appFolders.flatMap((f) => [`@/${f}`, `@/${f}/*`, `../${f}/*`, `../../${f}/*`])),
  },
);
