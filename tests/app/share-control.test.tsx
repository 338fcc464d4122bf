// Sharing from the Slate (docs/product.md journey 4, sync/SPEC.md S5, S8, S23): the owner shares a
// sketch to a group where they are not a viewer and stops sharing; each is a local write queued
// in the outbox, so it works offline; the groups are remembered on the device for that.
import { Text } from 'react-native';
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { useSession } from '@/hooks/useSession';
import { useLocalSketch } from '@/hooks/queries/useLocalSketches';
import { ShareControl } from '@/components/slate/ShareControl';
import { openDevice, syncStatus } from '@/lib/store/device';
import type { LocalStore } from '@/lib/store/local-store';
import { pushDelayMs } from '@/lib/sync/autosync';
import { mockFetch, renderWithProviders } from './support';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

const groups = [
  { id: 'g-lunch', name: 'Knot lunch', role: 'member' },
  { id: 'g-read', name: 'Reading group', role: 'viewer' },
];

function Shared({ id }: { id: string }) {
  const s = useLocalSketch(id);
  return s.data ? <ShareControl sketch={s.data} /> : <Text>loading</Text>;
}

let store: LocalStore;

// A write with the outbox not empty starts autosync's push timer (S29); let it fire so Jest exits.
afterAll(() => new Promise((done) => setTimeout(done, pushDelayMs + 100)));

beforeAll(async () => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'Ada' } });
  store = ((await openDevice('u1', () => 't')) as unknown as { store: LocalStore }).store;
});

test('S8, S23: the owner shares to a group where they may post, then stops sharing; both are outbox writes', async () => {
  const calls = mockFetch((c) => (c.path.endsWith('/api/groups') ? { status: 200, body: groups } : { status: 404, body: {} }));
  const sketch = await store.create({ title: 'Trefoil' });
  renderWithProviders(<Shared id={sketch.id} />);
  expect(await screen.findByText('Private: only you see it')).toBeOnTheScreen();
  const share = await screen.findByRole('button', { name: 'Share to Knot lunch' });
  expect(screen.queryByRole('button', { name: 'Share to Reading group' })).toBeNull(); // a viewer there (S23)

  await act(async () => fireEvent.press(share));
  await waitFor(() => expect(screen.getByTestId('share-state')).toHaveTextContent('Shared to Knot lunch (reaches the group on the next sync)'));
  expect((await store.get(sketch.id))!.groupId).toBe('g-lunch');
  expect(calls.filter((c) => c.method !== 'GET')).toEqual([]); // nothing posted: the sync engine pushes it

  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Stop sharing' })));
  await waitFor(() => expect(screen.getByTestId('share-state')).toHaveTextContent('Private: only you see it'));
  expect((await store.get(sketch.id))!.groupId).toBeNull();
  const written = (await store.revisions(sketch.id)).map((r) => r.fields.groupId);
  expect(written).toEqual([null, 'g-lunch', null]); // one revision per write
  expect(await store.groups()).toEqual(groups); // remembered for offline use
  const { engine } = (await openDevice('u1', () => 't')) as unknown as { engine: { syncNow: jest.Mock } };
  await waitFor(() => expect(engine.syncNow).toHaveBeenCalled(), { timeout: 4000 }); // S29: pushed soon after
});

test("S23: someone else's sketch shared to my group says where it is shared and offers no control", async () => {
  mockFetch(() => ({ status: 200, body: groups }));
  const now = new Date().toISOString();
  await store.storePage({
    changes: [{ seq: 1, record: { id: 'bruno-1', type: 'sketch', version: 1, ownerId: 'u2', fields: {
      title: 'Bruno’s link', seenAt: '', notes: '', tags: [], attachments: [], createdAt: now, updatedAt: now, groupId: 'g-lunch', deleted: false,
      diagram: { pd: [], unknots: 0, framings: [], strokes: [] } } } }],
    cursor: 1,
    hasMore: false,
    viewer: { userId: 'u1', groupIds: ['g-lunch', 'g-read'] },
  });
  renderWithProviders(<Shared id="bruno-1" />);
  expect(await screen.findByText('Shared to Knot lunch by its owner; only they can change where it is shared.')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: /Share to|Stop sharing/ })).toBeNull();
});

test('offline: the groups last seen on the device still offer sharing', async () => {
  mockFetch(() => Promise.reject(new TypeError('Network request failed')));
  syncStatus.setState({ online: false });
  const sketch = await store.create({ title: 'Figure-eight, no signal' });
  renderWithProviders(<Shared id={sketch.id} />);
  await act(async () => fireEvent.press(await screen.findByRole('button', { name: 'Share to Knot lunch' })));
  await waitFor(() => expect(screen.getByTestId('share-state')).toHaveTextContent(/^Shared to Knot lunch/));
  expect((await store.get(sketch.id))!).toMatchObject({ groupId: 'g-lunch', pending: 1 }); // joined into its unsent add (S8a)
  syncStatus.setState({ online: true });
});

test('S24: a share the server refused shows where the owner shares, with the reason, until dismissed', async () => {
  mockFetch(() => ({ status: 200, body: groups }));
  const sketch = await store.create({ title: 'Figure eight' });
  await store.update(sketch.id, { groupId: 'g-read' }); // became a viewer there before the push
  const box = (await store.outbox(50)).filter((m) => m.recordId === sketch.id);
  const share = box.find((m) => 'groupId' in m.fields && m.fields.groupId === 'g-read')!;
  await store.settle(box, box.map((m) => ({ mutationId: m.mutationId, status: m === share ? 'rejected' as const : 'applied' as const, reason: 'forbidden' as const, seq: 1 })));
  renderWithProviders(<Shared id={sketch.id} />);
  expect(await screen.findByText('The server refused sharing to Reading group: only the owner shares a sketch, and not to a group where they are a viewer.')).toBeOnTheScreen();
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Dismiss' })));
  await waitFor(() => expect(screen.queryByTestId('share-refused')).toBeNull());
  expect(await store.rejected(sketch.id)).toEqual([]);
});

test('a viewer in every group reads why there is no share button, and no promise of what sharing does', async () => {
  mockFetch((c) => (c.path.endsWith('/api/groups') ? { status: 200, body: [groups[1]] } : { status: 404, body: {} }));
  const sketch = await store.create({ title: 'Unknot, read only' });
  renderWithProviders(<Shared id={sketch.id} />);
  expect(await screen.findByText('In your groups you are a viewer; members, admins and owners share.')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: /^Share to/ })).toBeNull();
  expect(screen.queryByText(/Everyone in the group sees the sketch/)).toBeNull();
});
