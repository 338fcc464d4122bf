// Native: the session lives in expo-sqlite's key-value store (session-storage.web.ts is the web twin).
import Storage from 'expo-sqlite/kv-store';
import { SESSION_KEY, parseStoredSession, type StoredSession } from './stored-session';

export async function loadSession(): Promise<StoredSession | null> {
  return parseStoredSession(await Storage.getItemAsync(SESSION_KEY));
}

export async function saveSession(session: StoredSession): Promise<void> {
  await Storage.setItemAsync(SESSION_KEY, JSON.stringify(session));
}

export async function clearSession(): Promise<void> {
  await Storage.removeItemAsync(SESSION_KEY);
}
