// The device store's crypto in Node tests (the app passes expo-crypto's; same answers).
import { createHash, randomUUID } from 'node:crypto';

export const nodeCrypto = {
  newId: () => randomUUID(),
  sha256Hex: async (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex'),
};
