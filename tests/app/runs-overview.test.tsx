// The runs list with no runs: the invitation to start one, or, when the start form leads (opened
// from a sketch), one line saying so, never an empty pane.
import { screen } from '@testing-library/react-native';
import { RunsOverview } from '@/components/runs/RunsOverview';
import { useSession } from '@/hooks/useSession';
import { mockFetch, renderWithProviders } from './support';

jest.mock('expo-router', () => ({ useGlobalSearchParams: () => ({}), router: { push: jest.fn() } }));

beforeEach(() => {
  useSession.setState({ status: 'signedIn', token: 't', user: { id: 'u1', email: 'a@b.example', displayName: 'Ada' } });
  mockFetch(() => ({ status: 200, body: [] })); // no runs, no groups
});

test('no runs: the invitation names where the form is', async () => {
  renderWithProviders(<RunsOverview formWhere="on the right" />);
  expect(await screen.findByText('No runs yet')).toBeOnTheScreen();
  expect(screen.getByText(/^Start a run on the right, or from a sketch/)).toBeOnTheScreen();
});

test('no runs while the form leads: one line, not the invitation', async () => {
  renderWithProviders(<RunsOverview formWhere="on the right" hideEmpty />);
  expect(await screen.findByText('No runs yet.')).toBeOnTheScreen();
  expect(screen.queryByText(/^Start a run/)).toBeNull();
});
