// The session kept on the device: read back through the zod schema at launch, so a stale or
// tampered entry means "signed out", and sign-out forgets it.
import Storage from 'expo-sqlite/kv-store';
import { useSession } from '@/hooks/useSession';
import { SESSION_KEY } from '@/lib/stored-session';

const session = { token: 'tok-9', user: { id: 'u9', email: 'cy@uni.example', displayName: 'Cy' } };

async function launchWith(stored: string | null) {
  if (stored === null) await Storage.removeItemAsync(SESSION_KEY);
  else await Storage.setItemAsync(SESSION_KEY, stored);
  useSession.setState({ status: 'loading', token: null, user: null });
  await useSession.getState().hydrate();
  return useSession.getState();
}

test('a valid stored session signs in at launch', async () => {
  const state = await launchWith(JSON.stringify(session));
  expect(state.status).toBe('signedIn');
  expect(state.token).toBe('tok-9');
  expect(state.user).toEqual(session.user);
});

test.each([
  ['nothing stored', null],
  ['not JSON', '{oops'],
  ['wrong shape', JSON.stringify({ token: 42, user: null })],
  ['user without e-mail', JSON.stringify({ token: 't', user: { id: 'u', displayName: 'X' } })],
])('%s: signed out', async (_label, stored) => {
  const state = await launchWith(stored);
  expect(state.status).toBe('signedOut');
  expect(state.token).toBeNull();
});

test('sign in stores the session, sign out removes it', async () => {
  await launchWith(null);
  await useSession.getState().signIn(session);
  expect(JSON.parse((await Storage.getItemAsync(SESSION_KEY))!)).toEqual(session);
  await useSession.getState().signOut();
  expect(await Storage.getItemAsync(SESSION_KEY)).toBeNull();
  expect(useSession.getState().status).toBe('signedOut');
});
