// Group forms: create a group, invite with a role (the roles offered follow the inviter's role),
// and member rows that offer controls only where the rules allow them.
import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { CreateGroupForm } from '@/components/groups/CreateGroupForm';
import { InviteForm } from '@/components/groups/InviteForm';
import { MemberRow } from '@/components/groups/MemberRow';
import { useSession } from '@/hooks/useSession';
import { apiError, deferred, mockFetch, renderWithProviders } from './support';

const type = (label: string, text: string) => fireEvent.changeText(screen.getByLabelText(label), text);

beforeEach(() => {
  useSession.setState({ status: 'signedIn', token: 'tok', user: { id: 'me', email: 'me@uni.example', displayName: 'Me' } });
});

describe('CreateGroupForm', () => {
  test('a blank name is refused inline', async () => {
    const calls = mockFetch(() => ({ status: 500 }));
    renderWithProviders(<CreateGroupForm onCreated={jest.fn()} />);
    type('New group', '   ');
    fireEvent.press(screen.getByRole('button', { name: 'Create group' }));
    expect(await screen.findByText('Group name is required')).toBeOnTheScreen();
    expect(calls).toHaveLength(0);
  });

  test('submit posts the trimmed name with the token, is busy, then reports the new group', async () => {
    const held = deferred<{ status: number; body: unknown }>();
    const calls = mockFetch(() => held.promise);
    const onCreated = jest.fn();
    renderWithProviders(<CreateGroupForm onCreated={onCreated} />);
    type('New group', '  Knot seminar ');
    fireEvent.press(screen.getByRole('button', { name: 'Create group' }));
    expect(await screen.findByRole('button', { name: 'Creating…' })).toBeDisabled();
    expect(calls).toEqual([{ method: 'POST', path: '/api/groups', body: { name: 'Knot seminar' }, auth: 'Bearer tok' }]);
    held.resolve({ status: 201, body: { id: 'g1', name: 'Knot seminar', role: 'owner' } });
    await waitFor(() => expect(onCreated).toHaveBeenCalledWith({ id: 'g1', name: 'Knot seminar', role: 'owner' }));
  });

  test('an expired session signs out', async () => {
    mockFetch(() => apiError(401, 'unauthorized', 'Sign in again'));
    renderWithProviders(<CreateGroupForm onCreated={jest.fn()} />);
    type('New group', 'Knot seminar');
    fireEvent.press(screen.getByRole('button', { name: 'Create group' }));
    expect(await screen.findByText('Sign in again')).toBeOnTheScreen();
    expect(useSession.getState().status).toBe('signedOut');
  });
});

/** The options' names, as a screen reader reads them (their text). */
const radioNames = () => screen.getAllByRole('radio').map((r) => within(r).getByText(/\w/).props.children as string);

describe('InviteForm', () => {
  test('an owner may give every role; an admin cannot invite an owner', () => {
    mockFetch(() => ({ status: 500 }));
    const { unmount } = renderWithProviders(<InviteForm groupId="g1" myRole="owner" />);
    expect(radioNames()).toEqual(['owner', 'admin', 'member', 'viewer']);
    unmount();
    renderWithProviders(<InviteForm groupId="g1" myRole="admin" />);
    expect(radioNames()).toEqual(['admin', 'member', 'viewer']);
  });

  test('submit sends the e-mail and the chosen role, then confirms', async () => {
    const calls = mockFetch(() => ({
      status: 201,
      body: { id: 'i1', groupId: 'g1', email: 'bo@uni.example', role: 'viewer', expiresAt: '2030-01-01T00:00:00Z', createdAt: '2029-12-25T00:00:00Z' },
    }));
    renderWithProviders(<InviteForm groupId="g1" myRole="owner" />);
    type('E-mail', 'Bo@Uni.example');
    fireEvent.press(screen.getByRole('radio', { name: 'viewer' }));
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Invitation sent to bo@uni.example as viewer.')).toBeOnTheScreen();
    expect(calls[0]).toEqual({
      method: 'POST',
      path: '/api/groups/g1/invitations',
      body: { email: 'bo@uni.example', role: 'viewer' },
      auth: 'Bearer tok',
    });
  });

  test('a refusal from the server is shown', async () => {
    mockFetch(() => apiError(403, 'forbidden', 'Only owners and admins can invite'));
    renderWithProviders(<InviteForm groupId="g1" myRole="admin" />);
    type('E-mail', 'bo@uni.example');
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Only owners and admins can invite')).toBeOnTheScreen();
  });
});

describe('MemberRow', () => {
  const member = (role: 'owner' | 'admin' | 'member' | 'viewer') => ({ userId: 'u2', displayName: 'Bo', email: 'bo@uni.example', role });
  const controls = () => screen.queryAllByRole('button').map((b) => b.props.accessibilityLabel);

  test.each([
    ['owner', 'admin', true],
    ['admin', 'member', true],
    ['admin', 'owner', false], // an admin cannot touch an owner
    ['member', 'viewer', false],
    ['viewer', 'member', false],
  ] as const)('%s looking at a %s: controls shown = %s', (mine, theirs, shown) => {
    mockFetch(() => ({ status: 500 }));
    renderWithProviders(<MemberRow groupId="g1" member={member(theirs)} myRole={mine} isMe={false} first />);
    expect(controls()).toEqual(shown ? ['Change role', 'Remove'] : []);
  });

  test('changing a role sends PATCH with the new role', async () => {
    const calls = mockFetch(() => ({ status: 200, body: { ...member('viewer'), role: 'member' } }));
    renderWithProviders(<MemberRow groupId="g1" member={member('viewer')} myRole="owner" isMe={false} first />);
    fireEvent.press(screen.getByRole('button', { name: 'Change role' }));
    fireEvent.press(screen.getByRole('radio', { name: 'member' }));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]).toEqual({ method: 'PATCH', path: '/api/groups/g1/members/u2', body: { role: 'member' }, auth: 'Bearer tok' });
  });
});
