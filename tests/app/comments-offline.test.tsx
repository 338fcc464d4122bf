// The feed's comment form without a network (sync/SPEC.md S34): online it posts at once with an
// id made on the device; offline, or when the post does not reach the server, the comment waits
// in the device store under that same id, shows as waiting in the thread and in the sync status,
// and leaves the waiting state once the engine has sent it.
import { View } from 'react-native';
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { useSession } from '@/hooks/useSession';
import { Comments } from '@/components/feed/Comments';
import { SyncStatus } from '@/components/sync/SyncStatus';
import { openDevice, syncStatus } from '@/lib/store/device';
import type { LocalStore } from '@/lib/store/local-store';
import { pushDelayMs } from '@/lib/sync/autosync';
import { mockFetch, renderWithProviders, type Call } from './support';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

const SKETCH = 'sketch-1';
const me = { id: 'u1', email: 'ada@seminar.example', displayName: 'Ada' };
let store: LocalStore;

beforeAll(async () => {
  useSession.setState({ status: 'signedIn', token: 't', user: me });
  store = ((await openDevice('u1', () => 't')) as unknown as { store: LocalStore }).store;
});
afterEach(() => syncStatus.setState({ online: true }));
// Each queued comment starts autosync's push timer (S29); let it fire so Jest exits.
afterAll(() => new Promise((done) => setTimeout(done, pushDelayMs + 100)));

function renderThread() {
  renderWithProviders(
    <View>
      <SyncStatus />
      <Comments groupId="g1" sketchId={SKETCH} comments={[]} canComment moderate={false} />
    </View>,
  );
}

async function post(body: string) {
  // The box and its button have names of their own, so a screen reader tells them apart.
  fireEvent.changeText(await screen.findByLabelText('Comment'), body);
  expect(screen.getAllByLabelText('Post comment')).toHaveLength(1); // the button only
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Post comment' })));
}

const posts = (calls: Call[]) => calls.filter((c) => c.method === 'POST');

test('online: the comment is posted at once, with an id made on the device, and nothing is queued', async () => {
  const calls = mockFetch((c) => ({ status: 201, body: { id: (c.body as { id: string }).id, sketchId: SKETCH, author: me, body: 'Looks like 4_1', createdAt: new Date().toISOString(), editedAt: null } }));
  renderThread();
  await post('Looks like 4_1');
  await waitFor(() => expect(posts(calls)).toHaveLength(1));
  expect(posts(calls)[0]).toMatchObject({ path: `/api/sketches/${SKETCH}/comments`, body: { body: 'Looks like 4_1', id: expect.stringMatching(/^[0-9a-f-]{36}$/) } });
  expect(await store.comments(SKETCH)).toEqual([]);
  expect(screen.queryByText('Waiting to send')).toBeNull();
});

test('S34 offline: the comment waits on the device, shows as waiting, counts in the status, and no request is made', async () => {
  const calls = mockFetch(() => ({ status: 500, body: {} }));
  syncStatus.setState({ online: false });
  renderThread();
  await post('Is this **amphichiral**?');
  expect(await screen.findByText('Waiting to send')).toBeOnTheScreen();
  expect(screen.getByText('amphichiral')).toBeOnTheScreen(); // formatted like a sent comment
  expect(posts(calls)).toEqual([]);
  const [queued] = await store.comments(SKETCH);
  expect(queued).toMatchObject({ sketchId: SKETCH, body: 'Is this **amphichiral**?', state: 'waiting' });
  await waitFor(() => expect(screen.getByText('Offline, 1 change waiting')).toBeOnTheScreen()); // S31 counts it

  // The engine posts it and marks it sent (S34): it leaves the waiting state in the thread.
  await act(async () => store.commentSettled(queued));
  await waitFor(() => expect(screen.queryByText('Waiting to send')).toBeNull());
  expect(screen.getByText('Offline')).toBeOnTheScreen();
});

test('S34 online but the post does not reach the server: queued under the id it was posted with', async () => {
  const calls = mockFetch(() => Promise.reject(new TypeError('Network request failed')));
  renderThread();
  await post('Sent from the lecture hall');
  expect(await screen.findByText('Waiting to send')).toBeOnTheScreen();
  const sent = posts(calls)[0].body as { id: string };
  const queued = (await store.comments(SKETCH)).find((c) => c.body === 'Sent from the lecture hall')!;
  expect(queued).toMatchObject({ id: sent.id, state: 'waiting' }); // a retry of a post the server got is not a second comment
  expect(screen.getByPlaceholderText(/Write a comment/).props.value).toBe(''); // the form is ready for the next one
});

test('S34 a comment the server refused stays in the thread with the reason, and an API refusal is not queued', async () => {
  const calls = mockFetch(() => ({ status: 403, body: { error: { code: 'forbidden', message: 'Viewers cannot comment' } } }));
  const waiting = await store.addComment(SKETCH, 'Posted just before the sketch was unshared');
  await store.commentSettled(waiting, 'the sketch is not shared with you any more (POST /api/sketches/sketch-1/comments answered 404)'); // as the engine words it
  renderThread();
  expect(await screen.findByText('Not sent: the sketch is not shared with you any more (POST /api/sketches/sketch-1/comments answered 404)')).toBeOnTheScreen();
  const before = (await store.comments(SKETCH)).length;
  await post('One more');
  expect(await screen.findByText('Viewers cannot comment')).toBeOnTheScreen();
  expect(posts(calls)).toHaveLength(1);
  expect(await store.comments(SKETCH)).toHaveLength(before);
});

test('S34 the author discards a refused comment: it leaves the thread and the device; a waiting one has no Discard', async () => {
  mockFetch(() => ({ status: 500, body: {} }));
  const refused = await store.addComment(SKETCH, 'Refused, to discard');
  await store.commentSettled(refused, 'answered 403');
  const waiting = await store.addComment(SKETCH, 'Still waiting');
  renderThread();
  expect(await screen.findByText('Refused, to discard')).toBeOnTheScreen();
  const discards = () => screen.queryAllByRole('button', { name: 'Discard unsent comment' });
  const refusedBefore = (await store.comments(SKETCH)).filter((c) => c.state === 'rejected').length;
  expect(discards()).toHaveLength(refusedBefore); // one per refused comment, none for the waiting ones
  await act(async () => fireEvent.press(discards()[discards().length - 1]));
  await waitFor(() => expect(screen.queryByText('Refused, to discard')).toBeNull());
  const left = await store.comments(SKETCH);
  expect(left.map((c) => c.id)).not.toContain(refused.id);
  expect(left.map((c) => c.id)).toContain(waiting.id);
  expect(screen.getByText('Still waiting')).toBeOnTheScreen();
});
