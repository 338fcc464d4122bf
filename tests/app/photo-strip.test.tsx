// Feed photos (sync/SPEC.md S25, S27): a photo listed in the sketch's attachments (its id is the
// SHA-256 of its bytes) leaves the feed only when the owner edits the sketch, so the strip offers
// no Remove for it (the server would answer 403) and points its owner to the sketch's details;
// a photo uploaded in the feed keeps its Remove.
import { fireEvent, screen } from '@testing-library/react-native';
import { router } from 'expo-router';
import { useSession } from '@/hooks/useSession';
import { PhotoStrip } from '@/components/feed/PhotoStrip';
import type { Photo } from '@/shared/api/photos';
import { renderWithProviders } from './support';

jest.mock('expo-router', () => ({ router: { push: jest.fn() } }));

const me = { id: 'u1', email: 'ada@seminar.example', displayName: 'Ada' };
const photo = (id: string, uploader = me): Photo => ({
  id, sketchId: 's1', uploader: { id: uploader.id, displayName: uploader.displayName }, width: 800, height: 600, url: `/p/${id}`, thumbUrl: `/t/${id}`, createdAt: '2026-12-01T10:00:00.000Z',
});
const attached = 'a'.repeat(64); // shaped like a SHA-256 hex digest (S25)
const uploaded = '5d1f0c1e-7a2b-4c3d-8e9f-0a1b2c3d4e5f';

test("an attached photo shows no Remove; its owner is sent to the sketch's details", () => {
  useSession.setState({ status: 'signedIn', token: 't', user: me });
  renderWithProviders(<PhotoStrip groupId="g1" sketchId="s1" photos={[photo(attached), photo(uploaded)]} canUpload canModerate={false} />);
  expect(screen.getAllByRole('button', { name: 'Remove' })).toHaveLength(1); // only the feed upload
  fireEvent.press(screen.getByRole('link', { name: "Remove in the sketch's details" }));
  expect(router.push).toHaveBeenCalledWith('/sketches/s1');
});

test('a moderator sees Remove on feed uploads only, and no details link on photos not theirs', () => {
  const other = { id: 'u2', email: 'b@seminar.example', displayName: 'Bruno' };
  useSession.setState({ status: 'signedIn', token: 't', user: other });
  renderWithProviders(<PhotoStrip groupId="g1" sketchId="s1" photos={[photo(attached), photo(uploaded)]} canUpload canModerate />);
  expect(screen.getAllByRole('button', { name: 'Remove' })).toHaveLength(1);
  expect(screen.queryByRole('link', { name: "Remove in the sketch's details" })).toBeNull();
});

test('without the right to upload (a viewer), neither the button nor the note on what may be uploaded shows', () => {
  useSession.setState({ status: 'signedIn', token: 't', user: me });
  const view = renderWithProviders(<PhotoStrip groupId="g1" sketchId="s1" photos={[]} canUpload={false} canModerate={false} />);
  expect(screen.getByText('No board photos yet.')).toBeOnTheScreen();
  expect(screen.queryByRole('button', { name: 'Add a board photo' })).toBeNull();
  expect(screen.queryByText(/up to 10 MB/)).toBeNull();
  view.unmount();
  renderWithProviders(<PhotoStrip groupId="g1" sketchId="s1" photos={[]} canUpload canModerate={false} />);
  expect(screen.getByRole('button', { name: 'Add a board photo' })).toBeOnTheScreen();
  expect(screen.getByText(/up to 10 MB/)).toBeOnTheScreen();
});
