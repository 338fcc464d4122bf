// The invitation page (app/invite/[token].tsx) in Expo Router's test renderer: what each state
// of a link says, and accepting when signed in.
import { Slot } from 'expo-router';
import { fireEvent, renderRouter, screen, waitFor } from 'expo-router/testing-library';
import { QueryClientProvider } from '@tanstack/react-query';
import InvitationScreen from '@/app/invite/[token]';
import { queryClient } from '@/lib/query-client';
import { useSession } from '@/hooks/useSession';
import { apiError, mockFetch, type Call } from './support';

const preview = (status: 'pending' | 'accepted' | 'expired') => ({
  status: 200,
  body: { groupName: 'Knot seminar', role: 'member', email: 'bo@uni.example', invitedBy: 'Ann Kerr', expiresAt: '2030-01-01T00:00:00Z', status },
});

function Root() {
  return (
    <QueryClientProvider client={queryClient}>
      <Slot />
    </QueryClientProvider>
  );
}

function open(answer: (call: Call) => { status: number; body?: unknown }) {
  const calls = mockFetch(answer);
  renderRouter({ _layout: Root, 'invite/[token]': InvitationScreen }, { initialUrl: '/invite/tok123' });
  return calls;
}

beforeEach(async () => {
  await useSession.getState().signOut();
});

test('an unknown link says it is not valid', async () => {
  open(() => apiError(404, 'not_found', 'No such invitation'));
  expect(await screen.findByText('This invitation link is not valid')).toBeOnTheScreen();
});

test('an expired link says so and offers no way to accept', async () => {
  const calls = open(() => preview('expired'));
  expect(await screen.findByText('This invitation has expired')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: 'Accept and join' })).toBeNull();
  expect(screen.queryByRole('button', { name: 'Create an account to join' })).toBeNull();
  expect(calls.map((c) => c.path)).toEqual(['/api/invitations/tok123']);
});

test('a used link says so', async () => {
  open(() => preview('accepted'));
  expect(await screen.findByText('This invitation was already used')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: 'Accept and join' })).toBeNull();
});

test('signed out: shows group and role, and the ways to sign up or sign in', async () => {
  open(() => preview('pending'));
  expect(await screen.findByText('Join Knot seminar')).toBeOnTheScreen();
  expect(screen.getByText('member')).toBeOnTheScreen();
  expect(screen.getByRole('button', { name: 'Create an account to join' })).toBeOnTheScreen();
  expect(screen.getByRole('button', { name: 'I have an account: sign in' })).toBeOnTheScreen();
});

test('signed in: accept posts to the accept route and confirms', async () => {
  useSession.setState({ status: 'signedIn', token: 'tok', user: { id: 'u2', email: 'bo@uni.example', displayName: 'Bo' } });
  let accepted = false;
  const calls = open((c) => {
    if (c.method !== 'POST') return preview(accepted ? 'accepted' : 'pending');
    accepted = true;
    return { status: 200, body: { id: 'g1', name: 'Knot seminar', role: 'member' } };
  });
  fireEvent.press(await screen.findByRole('button', { name: 'Accept and join' }));
  expect(await screen.findByText('You joined Knot seminar')).toBeOnTheScreen();
  // The preview read again after my accept says "accepted": that is no "already used" for me.
  await waitFor(() => expect(calls.filter((c) => c.method === 'GET')).toHaveLength(2));
  expect(screen.getByText('You joined Knot seminar')).toBeOnTheScreen();
  expect(screen.queryByText('This invitation was already used')).toBeNull();
  expect(calls.find((c) => c.method === 'POST')).toEqual({ method: 'POST', path: '/api/invitations/tok123/accept', body: undefined, auth: 'Bearer tok' });
});

test('signed in: a link that expired meanwhile gets the clear message', async () => {
  useSession.setState({ status: 'signedIn', token: 'tok', user: { id: 'u2', email: 'bo@uni.example', displayName: 'Bo' } });
  open((c) => (c.method === 'POST' ? apiError(410, 'invitation_expired', 'The invitation has expired') : preview('pending')));
  fireEvent.press(await screen.findByRole('button', { name: 'Accept and join' }));
  expect(await screen.findByText('This invitation has expired')).toBeOnTheScreen();
});
