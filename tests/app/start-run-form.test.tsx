// The run form's choices: a cable sweep is chosen by its number of strands and says what it
// runs; "Also compute s" is a checkbox (the Slate's) whose checked state reaches the request;
// opened from a sketch, it names the sketch.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { StartRunForm } from '@/components/runs/StartRunForm';
import { useSession } from '@/hooks/useSession';
import { openDevice } from '@/lib/store/device';
import { apiError, mockFetch, renderWithProviders } from './support';

jest.mock('expo-router', () => ({ router: { push: jest.fn() } }));
jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

// A PD code of the trefoil (docs/conventions.md, PD code; from memory).
const trefoil = '[[4,2,5,1],[2,6,3,5],[6,4,1,3]]';
const refuse = () => apiError(503, 'unavailable', 'No server in this test.');

test('a cable sweep is chosen by its number of strands, with a note on the (r+, r-) it runs', async () => {
  const calls = mockFetch(refuse);
  renderWithProviders(<StartRunForm initialPD={trefoil} />);
  expect(screen.queryByText(/r\+ \+ r- ≤/)).toBeNull();
  expect(screen.queryByText(/Each component takes every/)).toBeNull();
  fireEvent.press(screen.getByRole('radio', { name: 'Cable sweep, up to 3 strands' }));
  expect(screen.getByText('Each component takes every (r₊, r₋) with r₊ + r₋ from 1 up to 3: r₊ parallel and r₋ reversed copies, following the framing.')).toBeOnTheScreen();
  fireEvent.press(screen.getByRole('button', { name: 'Start run' }));
  await waitFor(() => expect(calls).toHaveLength(1));
  expect(calls[0].body).toMatchObject({ kind: 'cable-sweep', sweep: { maxStrands: 3 } });
});

test('"Also compute s" is a checkbox: unchecked at first, checked when pressed, and sent so', async () => {
  const calls = mockFetch(refuse);
  renderWithProviders(<StartRunForm initialPD={trefoil} />);
  const box = screen.getByRole('checkbox', { name: 'Also compute s (Rasmussen invariant, knots only)' });
  expect(box).not.toBeChecked();
  expect(screen.queryByText(/[☐☑]/)).toBeNull();
  fireEvent.press(box);
  expect(box).toBeChecked();
  fireEvent.press(screen.getByRole('button', { name: 'Start run' }));
  await waitFor(() => expect(calls).toHaveLength(1));
  expect(calls[0].body).toMatchObject({ computeS: true });
});

test('opened from a sketch, the form names it, and the run goes on that sketch', async () => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'Ada' } });
  const { store } = await openDevice('u1', () => 't');
  const sketch = await store.create({ title: 'Trefoil from the talk' });
  const calls = mockFetch(refuse);
  renderWithProviders(<StartRunForm initialPD={trefoil} sketchId={sketch.id} />);
  expect(await screen.findByText(/^On “Trefoil from the talk” as it was last synced to the server/)).toBeOnTheScreen();
  fireEvent.press(screen.getByRole('button', { name: 'Start run' }));
  await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
  expect(calls.find((c) => c.method === 'POST')!.body).toMatchObject({ sketchId: sketch.id });
});
