// Component tests: device storage in memory (RNTL 13 registers its matchers itself).

import { configure } from '@testing-library/react-native';

// The first render of a file loads React Native and the app modules: seconds on a busy machine.
jest.setTimeout(20_000);
// waitFor / findBy give a busy machine 5 s, not 1 s, before they fail.
configure({ asyncUtilTimeout: 5_000 });

jest.mock('expo-sqlite/kv-store', () => {
  const items = new Map<string, string>();
  const store = {
    getItemAsync: async (k: string) => items.get(k) ?? null,
    setItemAsync: async (k: string, v: string) => void items.set(k, v),
    removeItemAsync: async (k: string) => items.delete(k),
    clearAsync: async () => (items.clear(), true),
  };
  return { __esModule: true, default: store };
});

// expo-crypto has no native module under Jest: the device's ids and hashes come from Node.
jest.mock('@/lib/crypto', () => {
  const { nodeCrypto } = jest.requireActual('../sync/node-crypto');
  return { __esModule: true, randomId: nodeCrypto.newId, sha256Hex: nodeCrypto.sha256Hex };
});

// TanStack Query keeps unused entries for gcTime (5 minutes) behind a timer that would hold
// Jest open; with gcTime Infinity no timer is set, and each test starts from an empty cache.
const { queryClient } = require('@/lib/query-client') as typeof import('@/lib/query-client');
const defaults = queryClient.getDefaultOptions();
queryClient.setDefaultOptions({
  queries: { ...defaults.queries, gcTime: Infinity },
  mutations: { ...defaults.mutations, gcTime: Infinity },
});
afterEach(() => queryClient.clear());
