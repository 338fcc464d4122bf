// Comparing and resolving a conflict copy on the device (sync/SPEC.md S20, S21).
import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { queryClient } from '@/lib/query-client';
import { useSession } from '@/hooks/useSession';
import { Conflicts } from '@/components/sync/Conflicts';
import { openDevice } from '@/lib/store/device';
import type { LocalStore } from '@/lib/store/local-store';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

test('S20, S21: both versions side by side; choosing the other version writes it and clears the conflict', async () => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'A' } });
  const { store } = (await openDevice('u1', () => 't')) as unknown as { store: LocalStore };
  const s = await store.create({ title: 'Borromean rings' });
  // As a pull would bring it: the server's conflict copy of a title edited on another device.
  const writer = { deviceId: 'other', clock: 3, seq: 5 };
  await store.storePage({
    changes: [
      {
        seq: 6,
        record: {
          id: 'conflict-1',
          type: 'conflict',
          version: 6,
          ownerId: 'u1',
          fields: { recordId: s.id, recordType: 'sketch', losing: { title: 'Whitehead link' }, winning: { title: 'Borromean rings' }, losingWriter: writer, winningWriter: { ...writer, deviceId: 'this', seq: 6 }, resolved: false, deleted: false },
        },
      },
    ],
    cursor: 6,
    hasMore: false,
    viewer: { userId: 'u1', groupIds: [] },
  });
  render(
    <QueryClientProvider client={queryClient}>
      <Conflicts />
    </QueryClientProvider>,
  );
  expect(await screen.findByText('Now: Borromean rings')).toBeOnTheScreen();
  expect(screen.getByText('Other version: Whitehead link')).toBeOnTheScreen();
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Use the other version' })));
  expect(await screen.findByText('No conflicts')).toBeOnTheScreen();
  expect((await store.get(s.id))?.title).toBe('Whitehead link');
  const box = await store.outbox(10);
  // The sketch was never sent, so the chosen title joins its add (S8a); then the resolution.
  expect(box.map((m) => [m.type, m.op, m.fields.title])).toEqual([['sketch', 'add', 'Whitehead link'], ['conflict', 'update', undefined]]);
  expect(box.at(-1)?.fields).toEqual({ resolved: true, deleted: false });
});
