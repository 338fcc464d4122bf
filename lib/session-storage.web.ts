// Web: the session lives in the origin's localStorage, so a reload stays signed in.
import { SESSION_KEY, parseStoredSession, type StoredSession } from './stored-session';

export async function loadSession(): Promise<StoredSession | null> {
  return parseStoredSession(globalThis.localStorage?.getItem(SESSION_KEY) ?? null);
}

export async function saveSession(session: StoredSession): Promise<void> {
  globalThis.localStorage?.setItem(SESSION_KEY, JSON.stringify(session));
}

export async function clearSession(): Promise<void> {
  globalThis.localStorage?.removeItem(SESSION_KEY);
}
