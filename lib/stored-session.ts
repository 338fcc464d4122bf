// What the device keeps between launches: the token and who it belongs to. Whatever is read back
// is validated, so a stale or hand-edited entry means "signed out", never a crash.
import { AuthResponse } from '@/shared/api/auth';

export const SESSION_KEY = 'overstrand.session.v1';

export const StoredSession = AuthResponse;
export type StoredSession = AuthResponse;

export function parseStoredSession(raw: string | null): StoredSession | null {
  if (raw === null) return null;
  try {
    const parsed = StoredSession.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
