// "Check on the server" in the Readout's bands section: a signed-in user online starts a bands
// run (POST /api/runs, kind "bands", the drawing's PD code and saddles) on the sketch, or on the
// code alone when the server does not have the sketch yet, and gets the run page's link;
// offline or signed out the section says why there is no button.
import { act, fireEvent, screen } from '@testing-library/react-native';
import { BandsServerCheck } from '@/components/readout/BandsServerCheck';
import { useSession } from '@/hooks/useSession';
import { syncStatus } from '@/lib/store/device';
import { useSlate } from '@/lib/slate/slate-store';
import type { RunDetail } from '@/shared/api/runs';
import { apiError, mockFetch, renderWithProviders, type Call } from './support';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());
jest.mock('expo-router', () => {
  const { Text } = jest.requireActual('react-native');
  return { Link: ({ href, children }: { href: string; children: React.ReactNode }) => <Text role="link" aria-label={`${children} (${href})`}>{children}</Text> };
});

// The positive trefoil's code (docs/conventions.md, Braid word) with one band: the UI only passes them on.
const presentation = { pd: [[4, 2, 5, 1], [2, 6, 3, 5], [6, 4, 1, 3]] as [number, number, number, number][], unknots: 0, saddles: [{ a: 1, b: 3 }] };

const run = (over: Partial<RunDetail> = {}): RunDetail => ({
  id: 'r1', kind: 'bands', status: 'queued', label: 'Trefoil', sketchId: 's1', groupId: null, crossings: 3, ring: 'Z', reduced: false,
  progress: { fraction: 0, objects: 0 }, error: null, createdAt: '2026-12-04T10:00:00.000Z', startedAt: null, finishedAt: null,
  startedBy: { id: 'u1', displayName: 'Ada' }, parentRunId: null, reusedFrom: null, cable: null, sweep: null, source: null, computeS: false,
  worker: null, diagram: { pd: presentation.pd, unknots: 0, bands: [[1, 3]] }, result: null, children: [], ...over,
});

const posts = (calls: Call[]) => calls.filter((c) => c.method === 'POST').map((c) => c.body);

beforeEach(() => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'Ada' } });
  syncStatus.setState({ online: true });
  useSlate.setState({ sketchId: 's1' });
});

test('online: the run starts on the sketch with its bands, and the run page is linked', async () => {
  const calls = mockFetch((c) => ({ status: c.method === 'POST' ? 201 : 200, body: run() }));
  renderWithProviders(<BandsServerCheck presentation={presentation} />);
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Check on the server' })));
  expect(await screen.findByRole('link', { name: 'open the run page (/runs/r1)' })).toBeOnTheScreen();
  expect(screen.getByTestId('readout-bands-run')).toHaveTextContent('Bands run queued: open the run page');
  expect(posts(calls)).toEqual([{ kind: 'bands', sketchId: 's1', diagram: { pd: presentation.pd, unknots: 0, bands: [[1, 3]] } }]);
});

test('a sketch the server does not have yet: the run goes on the code alone', async () => {
  useSlate.setState({ sketchId: 's2' });
  const calls = mockFetch((c) => {
    const body = c.body as { sketchId?: string } | undefined;
    if (c.method === 'POST' && body?.sketchId) return apiError(404, 'not_found', 'No such sketch, or it is not shared with you');
    return { status: c.method === 'POST' ? 201 : 200, body: run({ id: 'r2', sketchId: null }) };
  });
  renderWithProviders(<BandsServerCheck presentation={presentation} />);
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Check on the server' })));
  expect(await screen.findByRole('link', { name: 'open the run page (/runs/r2)' })).toBeOnTheScreen();
  expect(posts(calls)).toEqual([
    { kind: 'bands', sketchId: 's2', diagram: { pd: presentation.pd, unknots: 0, bands: [[1, 3]] } },
    { kind: 'bands', label: 'Bands: 1 on a 3-crossing drawing', diagram: { pd: presentation.pd, unknots: 0, bands: [[1, 3]] } },
  ]);
  expect(screen.queryByRole('alert')).toBeNull();
});

test('offline, or signed out: no button, and the reason', () => {
  useSlate.setState({ sketchId: 's3' });
  syncStatus.setState({ online: false });
  const { unmount } = renderWithProviders(<BandsServerCheck presentation={presentation} />);
  expect(screen.getByText('Offline: checking on the server needs the network.')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: 'Check on the server' })).toBeNull();
  unmount();
  useSession.setState({ status: 'signedOut', token: null, user: null });
  renderWithProviders(<BandsServerCheck presentation={presentation} />);
  expect(screen.getByText('Sign in to check it on the server.')).toBeOnTheScreen();
});
