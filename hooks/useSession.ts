// The signed-in session: a small zustand store mirrored to device storage (lib/session-storage).
import { create } from 'zustand';
import type { AuthResponse, User } from '@/shared/api/auth';
import { configureApi } from '@/lib/api';
import { clearSession, loadSession, saveSession } from '@/lib/session-storage';
import { queryClient } from '@/lib/query-client';

type Status = 'loading' | 'signedOut' | 'signedIn';

type SessionState = {
  status: Status;
  token: string | null;
  user: User | null;
  /** Read the stored session once at launch. */
  hydrate: () => Promise<void>;
  signIn: (auth: AuthResponse) => Promise<void>;
  signOut: () => Promise<void>;
};

export const useSession = create<SessionState>((set, get) => ({
  status: 'loading',
  token: null,
  user: null,
  hydrate: async () => {
    const stored = await loadSession().catch(() => null);
    // A sign-in that finished while storage was being read wins.
    if (get().status !== 'loading') return;
    set(stored ? { status: 'signedIn', ...stored } : { status: 'signedOut', token: null, user: null });
  },
  signIn: async (auth) => {
    // Nothing cached for a previous account may leak into this one.
    queryClient.clear();
    set({ status: 'signedIn', token: auth.token, user: auth.user });
    await saveSession(auth);
  },
  signOut: async () => {
    set({ status: 'signedOut', token: null, user: null });
    queryClient.clear();
    await clearSession();
  },
}));

configureApi({
  token: () => useSession.getState().token,
  onUnauthorized: () => void useSession.getState().signOut(),
});
