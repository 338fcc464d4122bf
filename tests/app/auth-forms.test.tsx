// Sign-in and sign-up forms: shared zod rules shown inline, the API called with the parsed
// values, a busy state while the request is in flight, server errors shown, session kept.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import Storage from 'expo-sqlite/kv-store';
import { SignInForm } from '@/components/auth/SignInForm';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { useSession } from '@/hooks/useSession';
import { SESSION_KEY } from '@/lib/stored-session';
import { queryClient } from '@/lib/query-client';
import { apiError, deferred, mockFetch, renderWithProviders } from './support';

const user = { id: 'u1', email: 'ann@uni.example', displayName: 'Ann Kerr' };
const type = (label: string, text: string) => fireEvent.changeText(screen.getByLabelText(label), text);

beforeEach(async () => {
  await useSession.getState().signOut();
  queryClient.clear();
});

describe('SignInForm', () => {
  test('empty submit shows both field errors inline and calls nothing', async () => {
    const calls = mockFetch(() => ({ status: 500 }));
    renderWithProviders(<SignInForm />);
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('E-mail is required')).toBeOnTheScreen();
    expect(screen.getByText('Password is required')).toBeOnTheScreen();
    expect(calls).toHaveLength(0);
  });

  test('a malformed address is refused before any request', async () => {
    const calls = mockFetch(() => ({ status: 500 }));
    renderWithProviders(<SignInForm />);
    type('E-mail', 'ann-at-uni');
    type('Password', 'whatever');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter a valid e-mail address')).toBeOnTheScreen();
    expect(calls).toHaveLength(0);
  });

  test('submit posts the normalised values, is busy meanwhile, then keeps the session', async () => {
    const held = deferred<{ status: number; body: unknown }>();
    const calls = mockFetch(() => held.promise);
    renderWithProviders(<SignInForm />);
    type('E-mail', '  Ann@Uni.EXAMPLE ');
    type('Password', 'long enough pw');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

    const busy = await screen.findByRole('button', { name: 'Signing in…' });
    expect(busy).toBeDisabled();
    expect(calls).toEqual([
      { method: 'POST', path: '/api/auth/login', body: { email: 'ann@uni.example', password: 'long enough pw' }, auth: null },
    ]);

    held.resolve({ status: 200, body: { token: 'tok-1', user } });
    await waitFor(() => expect(useSession.getState().status).toBe('signedIn'));
    expect(useSession.getState().user).toEqual(user);
    expect(JSON.parse((await Storage.getItemAsync(SESSION_KEY))!)).toEqual({ token: 'tok-1', user });
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeEnabled();
  });

  test('wrong credentials: the server message is shown and nothing is kept', async () => {
    mockFetch(() => apiError(401, 'invalid_credentials', 'Wrong e-mail or password'));
    renderWithProviders(<SignInForm />);
    type('E-mail', 'ann@uni.example');
    type('Password', 'nope nope');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Could not sign in')).toBeOnTheScreen();
    expect(screen.getByText('Wrong e-mail or password')).toBeOnTheScreen();
    expect(useSession.getState().status).toBe('signedOut');
    expect(await Storage.getItemAsync(SESSION_KEY)).toBeNull();
  });

  test('an unreachable server gets a plain explanation', async () => {
    global.fetch = jest.fn(async () => {
      throw new TypeError('Failed to fetch');
    }) as typeof fetch;
    renderWithProviders(<SignInForm />);
    type('E-mail', 'ann@uni.example');
    type('Password', 'long enough pw');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Cannot reach the server. Check the connection and try again.')).toBeOnTheScreen();
  });
});

describe('SignUpForm', () => {
  test('each field shows its own rule inline', async () => {
    const calls = mockFetch(() => ({ status: 500 }));
    renderWithProviders(<SignUpForm />);
    type('Password', 'short');
    fireEvent.press(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('Name is required')).toBeOnTheScreen();
    expect(screen.getByText('E-mail is required')).toBeOnTheScreen();
    expect(screen.getByText('Password must be at least 8 characters')).toBeOnTheScreen();
    expect(calls).toHaveLength(0);
  });

  test('submit registers with the trimmed name and signs in', async () => {
    const calls = mockFetch(() => ({ status: 201, body: { token: 'tok-2', user } }));
    renderWithProviders(<SignUpForm defaultEmail="ann@uni.example" />);
    type('Name', '  Ann Kerr ');
    type('Password', 'long enough pw');
    fireEvent.press(screen.getByRole('button', { name: 'Create account' }));
    await waitFor(() => expect(useSession.getState().status).toBe('signedIn'));
    expect(calls[0]).toEqual({
      method: 'POST',
      path: '/api/auth/register',
      body: { displayName: 'Ann Kerr', email: 'ann@uni.example', password: 'long enough pw' },
      auth: null,
    });
  });

  test('a taken e-mail is reported beside the e-mail field', async () => {
    mockFetch(() => apiError(409, 'email_taken', 'An account with this e-mail already exists'));
    renderWithProviders(<SignUpForm />);
    type('Name', 'Ann Kerr');
    type('E-mail', 'ann@uni.example');
    type('Password', 'long enough pw');
    fireEvent.press(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('An account with this e-mail already exists')).toBeOnTheScreen();
    expect(screen.queryByText('Could not create the account')).toBeNull();
  });

  test('server field errors (invalid_input) land on their fields', async () => {
    mockFetch(() => apiError(400, 'invalid_input', 'Invalid input', { displayName: 'Name is taken by a robot' }));
    renderWithProviders(<SignUpForm />);
    type('Name', 'Ann Kerr');
    type('E-mail', 'ann@uni.example');
    type('Password', 'long enough pw');
    fireEvent.press(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('Name is taken by a robot')).toBeOnTheScreen();
  });
});
