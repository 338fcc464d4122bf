// The hooks the Sketches screens use: sketches come from the device store (here its memory
// tables and a stand-in engine), a write shows at once and counts as waiting, and a push
// follows shortly (sync/SPEC.md S8, S29, S31).
import { Pressable, Text, View } from 'react-native';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { queryClient } from '@/lib/query-client';
import { useSession } from '@/hooks/useSession';
import { useLocalSketches, useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { useSyncStatus } from '@/hooks/useDevice';
import { SyncStatus } from '@/components/sync/SyncStatus';
import { openDevice } from '@/lib/store/device';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

function Sketchbook() {
  const list = useLocalSketches();
  const { create } = useSketchWrites();
  const { label } = useSyncStatus();
  return (
    <View>
      <Text>{label}</Text>
      {list.isSuccess ? <Text>{`${list.data.length} sketches`}</Text> : null}
      {(list.data ?? []).map((s) => (
        <Text key={s.id}>{s.title}</Text>
      ))}
      <Pressable accessibilityRole="button" onPress={() => create.mutate({ title: 'Trefoil from the talk' })}>
        <Text>New sketch</Text>
      </Pressable>
    </View>
  );
}

test('S8, S29, S31: a new sketch appears from the device store, counts as waiting, and is pushed soon', async () => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'A' } });
  render(
    <QueryClientProvider client={queryClient}>
      <Sketchbook />
    </QueryClientProvider>,
  );
  expect(await screen.findByText('0 sketches')).toBeOnTheScreen(); // the store is open
  expect(screen.getByText('Not synced yet')).toBeOnTheScreen(); // S31: the stand-in engine has run no round, so never "Up to date"
  await act(async () => fireEvent.press(await screen.findByRole('button', { name: 'New sketch' })));
  expect(await screen.findByText('Trefoil from the talk')).toBeOnTheScreen();
  expect(screen.getByText('1 sketches')).toBeOnTheScreen();
  await waitFor(() => expect(screen.getByText('1 change waiting')).toBeOnTheScreen());
  const { engine } = (await openDevice('u1', () => 't')) as unknown as { engine: { start: jest.Mock; syncNow: jest.Mock } };
  expect(engine.start).toHaveBeenCalledTimes(1); // S29: on start
  await waitFor(() => expect(engine.syncNow).toHaveBeenCalled(), { timeout: 4000 }); // soon after the write
});

test('S29, S31: the status pill shows the state and "Sync now" starts a round', async () => {
  const { engine } = (await openDevice('u1', () => 't')) as unknown as { engine: { syncNow: jest.Mock } };
  engine.syncNow.mockClear();
  render(
    <QueryClientProvider client={queryClient}>
      <SyncStatus />
    </QueryClientProvider>,
  );
  expect(await screen.findByTestId('sync-status')).toBeOnTheScreen();
  await waitFor(() => expect(screen.getByRole('button', { name: 'Sync now' })).toBeOnTheScreen());
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Sync now' })));
  expect(engine.syncNow).toHaveBeenCalledTimes(1);
});
