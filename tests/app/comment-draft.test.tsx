// A comment being typed outlives its composer: the page refetching or remounting keeps the text,
// and the draft ends when the comment is posted.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { useSession } from '@/hooks/useSession';
import { Comments } from '@/components/feed/Comments';
import { useCommentDrafts } from '@/components/feed/draft-store';
import { mockFetch, renderWithProviders } from './support';

jest.mock('@/lib/store/device', () => jest.requireActual('./device-mock').deviceMock());

const SKETCH = 'sketch-draft';
const me = { id: 'u1', email: 'ada@seminar.example', displayName: 'Ada' };
beforeAll(() => useSession.setState({ status: 'signedIn', token: 't', user: me }));

const thread = () => <Comments groupId="g1" sketchId={SKETCH} comments={[]} canComment moderate={false} />;

test('the text typed survives an unmount and a new mount, and the draft ends once posted', async () => {
  const first = renderWithProviders(thread());
  fireEvent.changeText(await screen.findByLabelText('Comment'), 'Is this 5_2?');
  first.unmount();
  renderWithProviders(thread());
  expect((await screen.findByLabelText('Comment')).props.value).toBe('Is this 5_2?');
  mockFetch((c) => ({ status: 201, body: { id: (c.body as { id: string }).id, sketchId: SKETCH, author: me, body: 'Is this 5_2?', createdAt: new Date().toISOString(), editedAt: null } }));
  await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Post comment' })));
  await waitFor(() => expect(useCommentDrafts.getState().drafts[`new:${SKETCH}`]).toBeUndefined());
  expect(screen.getByLabelText('Comment').props.value).toBe('');
});
