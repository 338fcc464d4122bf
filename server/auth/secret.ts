// The token signing key when JWT_SECRET is not given: 32 random bytes made on the first start
// and kept beside the database (owner-only), so tokens survive restarts and no key is ever
// fixed in the source. An in-memory database gets a fresh key per start.
import { randomBytes } from 'node:crypto';
import { readFile, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';

export const secretFile = (dbPath: string) => join(dirname(dbPath), 'jwt-secret');

export async function keptJwtSecret(dbPath: string): Promise<string> {
  if (dbPath === ':memory:') return randomBytes(32).toString('hex');
  const file = secretFile(dbPath);
  const fresh = randomBytes(32).toString('hex');
  // 'wx' fails when the file exists: two starts at once both end up with the one written first.
  await writeFile(file, fresh, { flag: 'wx', mode: 0o600 }).catch((err: NodeJS.ErrnoException) => {
    if (err.code !== 'EEXIST') throw err;
  });
  const kept = (await readFile(file, 'utf8')).trim();
  if (kept.length < 32) throw new Error(`${file} holds no usable key; delete it to make a new one (every token is then signed out)`);
  return kept;
}
