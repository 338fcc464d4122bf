// Ids and content hashes on the device through expo-crypto, which native React Native has and
// the browser's Web Crypto alone does not give it.
import * as Crypto from 'expo-crypto';

export const randomId = (): string => Crypto.randomUUID();

export async function sha256Hex(bytes: Uint8Array): Promise<string> {
  const digest = await Crypto.digest(Crypto.CryptoDigestAlgorithm.SHA256, new Uint8Array(bytes));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}
